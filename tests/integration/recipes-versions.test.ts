import { eq, sql } from "drizzle-orm";
import { beforeAll, beforeEach, describe, expect, it } from "vitest";
import {
  forkRecipeVersionAction,
  releaseRecipeVersionAction,
  restoreRecipeVersionAction,
  saveRecipeVersionAction,
} from "@/app/(app)/recipes/[recipeId]/actions";
import { db } from "@/db/client";
import { recipeVersions } from "@/db/schema";
import { getRecipe } from "@/lib/data/recipes";
import { getVersion, listVersionNumbers, listVersions } from "@/lib/data/recipes-versions";
import { createTeam, signInAs, type TeamFixture } from "../support/fixtures";
import { darkLines, darkRecipe, referenceIds, uniqueName } from "../support/recipe-fixtures";
import { freshRequest } from "../support/request";

let team: TeamFixture;
let ids: Awaited<ReturnType<typeof referenceIds>>;

beforeAll(async () => {
  team = await createTeam("versions");
  ids = await referenceIds(team.workspaceId);
});

beforeEach(async () => {
  freshRequest();
  await signInAs(team.people.formulator.id, team.workspaceId);
});

const save = (recipeId: string, baseVersionNo: number, nibs: string, note?: string) =>
  saveRecipeVersionAction({ recipeId, baseVersionNo, barMassGrams: "70", note, lines: darkLines(ids, nibs) });

describe("saving versions of one base at the same time", () => {
  it("lets exactly one of 20 parallel saves win; the rest conflict, and all of them land after rebasing, with no gaps", async () => {
    const recipeId = await darkRecipe(team);
    const drafts = Array.from({ length: 20 }, (_, i) => (60 + i * 0.1).toFixed(1));
    const results = await Promise.all(drafts.map((nibs, i) => save(recipeId, 1, nibs, `draft ${i}`)));

    const winners = results.filter((r) => r.ok);
    const conflicts = results.filter((r) => !r.ok && r.code === "conflict");
    expect(winners).toHaveLength(1);
    expect(conflicts).toHaveLength(19);
    expect(conflicts[0]!.ok ? "" : conflicts[0]!.message).toMatch(/v2 was saved since you started from v1\. Nothing was overwritten/);
    expect(await listVersionNumbers({ workspaceId: team.workspaceId, recipeId })).toEqual([1, 2]);

    // Nothing is lost: each losing draft is saved again on top of whatever is latest by then.
    for (const [i, r] of results.entries()) {
      if (r.ok) continue;
      const latest = (await getRecipe({ workspaceId: team.workspaceId, recipeId })).latestVersionNo;
      const again = await save(recipeId, latest, drafts[i]!, `draft ${i}`);
      expect(again.ok).toBe(true);
    }
    const numbers = await listVersionNumbers({ workspaceId: team.workspaceId, recipeId });
    expect(numbers).toEqual(Array.from({ length: 21 }, (_, i) => i + 1));
    const versions = await listVersions({ workspaceId: team.workspaceId, recipeId });
    expect(new Set(versions.map((v) => v.note)).size).toBe(21);
    for (const [i, nibs] of drafts.entries()) {
      const v = versions.find((x) => x.note === `draft ${i}`)!;
      const detail = await getVersion({ workspaceId: team.workspaceId, recipeId, versionNo: v.versionNo });
      expect(detail.lines[0]).toMatchObject({ ingredientId: ids.nibs, percent: `${nibs}000` });
    }
  });

  it("has a database key that refuses a second row with the same recipe and version number", async () => {
    const recipeId = await darkRecipe(team);
    const [v1] = await db.select().from(recipeVersions).where(eq(recipeVersions.recipeId, recipeId));
    const { id: _id, ...copy } = v1!;
    await expect(db.insert(recipeVersions).values(copy)).rejects.toThrow();
  });

  it("refuses to change a saved version, even directly in the database", async () => {
    const recipeId = await darkRecipe(team);
    const err = await db.execute(sql`update recipe_versions set note = 'edited' where recipe_id = ${recipeId}`).catch((e: unknown) => e);
    expect((err as { cause?: Error }).cause?.message).toBe("rows of recipe_versions are insert-only");
  });
});

describe("what the server computes at save", () => {
  it("recomputes composition and cost itself and refuses client totals or lines that do not add up to 100 %", async () => {
    const recipeId = await darkRecipe(team);
    const sneaky = await saveRecipeVersionAction({ recipeId, baseVersionNo: 1, barMassGrams: "70", lines: darkLines(ids, "64"), cocoaPercent: "99" });
    expect(sneaky).toMatchObject({ ok: false, code: "invalid" });
    const off = await saveRecipeVersionAction({
      recipeId,
      baseVersionNo: 1,
      barMassGrams: "70",
      lines: [...darkLines(ids, "64").slice(0, 3)],
    });
    expect(off).toMatchObject({ ok: false, code: "invalid" });
    expect(off.ok ? [] : off.fieldErrors?.lines).toEqual(["The lines add up to 99.7 %; they must add up to exactly 100 %."]);

    expect((await save(recipeId, 1, "64")).ok).toBe(true);
    const v2 = await getVersion({ workspaceId: team.workspaceId, recipeId, versionNo: 2 });
    // 64 % nibs (55 % cocoa butter, 2 % water: 98 % dry cocoa solids) + 7.3 % cocoa butter = 70.02 %.
    expect(v2.evaluation.composition.totalDryCocoaSolids).toBe("70.02");
    expect(v2.cocoaPercent).toBe("70.0200");
    expect(v2.lines.map((l) => l.name)).toEqual(["Cocoa nibs (roasted)", "Cocoa butter", "Sugar (sucrose)", "Soy lecithin"]);
  });
});

describe("restoring an old version", () => {
  it("saves the old lines as a new version and keeps every version", async () => {
    const recipeId = await darkRecipe(team);
    expect((await save(recipeId, 1, "62")).ok).toBe(true);
    const restored = await restoreRecipeVersionAction({ recipeId, versionNo: 1, baseVersionNo: 2 });
    expect(restored).toEqual({ ok: true, data: { versionNo: 3 } });
    const [v1, v3] = await Promise.all([1, 3].map((n) => getVersion({ workspaceId: team.workspaceId, recipeId, versionNo: n })));
    expect(v3!.lines.map((l) => [l.ingredientId, l.percent])).toEqual(v1!.lines.map((l) => [l.ingredientId, l.percent]));
    expect(v3).toMatchObject({ restoredFromVersionNo: 1, basedOnVersionNo: 2, note: "Restored from v1." });
    expect(await listVersionNumbers({ workspaceId: team.workspaceId, recipeId })).toEqual([1, 2, 3]);
  });

  it("conflicts when someone saved after the version the user was looking at", async () => {
    const recipeId = await darkRecipe(team);
    expect((await save(recipeId, 1, "62")).ok).toBe(true);
    expect(await restoreRecipeVersionAction({ recipeId, versionNo: 1, baseVersionNo: 1 })).toMatchObject({ ok: false });
    expect(await restoreRecipeVersionAction({ recipeId, versionNo: 2, baseVersionNo: 1 })).toMatchObject({ ok: false, code: "conflict" });
  });
});

describe("forking a version into a new recipe", () => {
  it("creates a recipe whose v1 has that version's lines and remembers where it came from", async () => {
    const recipeId = await darkRecipe(team);
    expect((await save(recipeId, 1, "66")).ok).toBe(true);
    const name = uniqueName("Fork");
    const fork = await forkRecipeVersionAction({ recipeId, versionNo: 2, name });
    expect(fork.ok).toBe(true);
    const newId = fork.ok ? fork.data.recipeId : "";
    const recipe = await getRecipe({ workspaceId: team.workspaceId, recipeId: newId });
    expect(recipe).toMatchObject({ name, origin: "copy", copiedFromRecipeId: recipeId, copiedFromVersionNo: 2, latestVersionNo: 1 });
    const v1 = await getVersion({ workspaceId: team.workspaceId, recipeId: newId, versionNo: 1 });
    expect(v1.lines[0]!.percent).toBe("66.0000");
    // The source is untouched.
    expect(await listVersionNumbers({ workspaceId: team.workspaceId, recipeId })).toEqual([1, 2]);
  });

  it("refuses a name already taken, as a field error", async () => {
    const recipeId = await darkRecipe(team);
    const taken = (await getRecipe({ workspaceId: team.workspaceId, recipeId })).name;
    const fork = await forkRecipeVersionAction({ recipeId, versionNo: 1, name: taken });
    expect(fork).toMatchObject({ ok: false, code: "invalid", fieldErrors: { name: ["A recipe with this name already exists. Choose another name."] } });
  });
});

describe("releasing versions", () => {
  it("appends a release record, shows production only released versions, and refuses releasing the current one twice", async () => {
    const recipeId = await darkRecipe(team);
    expect((await save(recipeId, 1, "63")).ok).toBe(true);
    expect((await releaseRecipeVersionAction({ recipeId, versionNo: 1, note: "first run" })).ok).toBe(true);
    expect((await releaseRecipeVersionAction({ recipeId, versionNo: 2 })).ok).toBe(true);
    expect(await releaseRecipeVersionAction({ recipeId, versionNo: 2 })).toMatchObject({ ok: false, code: "conflict", message: "v2 is already the released version." });
    expect((await releaseRecipeVersionAction({ recipeId, versionNo: 1, note: "back to v1" })).ok).toBe(true);
    const recipe = await getRecipe({ workspaceId: team.workspaceId, recipeId });
    expect(recipe.releasedVersionNo).toBe(1);
    expect((await save(recipeId, 2, "65")).ok).toBe(true);
    const released = await listVersions({ workspaceId: team.workspaceId, recipeId, releasedOnly: true });
    expect(released.map((v) => v.versionNo)).toEqual([2, 1]);
    expect(await releaseRecipeVersionAction({ recipeId, versionNo: 9 })).toMatchObject({ ok: false, code: "not_found" });
  });
});
