/**
 * The label data path: a saved version → library nutrients (with reference fallbacks) →
 * label settings → the EU table, US panel and statements; the settings action; the download
 * route printing with Chromium (against a stand-in print page, tests/support/label-print-stub.ts).
 */
import { and, eq } from "drizzle-orm";
import { afterAll, beforeAll, beforeEach, describe, expect, it } from "vitest";
import { saveLabelSettingsAction } from "@/app/(app)/recipes/[recipeId]/label/actions";
import { GET as getLabelFile } from "@/app/api/labels/[recipeId]/route";
import { db } from "@/db/client";
import { ingredients } from "@/db/schema";
import type { Viewer } from "@/lib/auth/current";
import { getLabelSettings } from "@/lib/data/labels";
import { releaseVersion } from "@/lib/data/recipes-releases";
import { saveRecipeVersion } from "@/lib/data/recipes-save";
import { AppError } from "@/lib/errors";
import { loadLabel } from "@/lib/labels/load-label";
import { createTeam, signInAs, type TeamFixture } from "../support/fixtures";
import { startPrintStub, type PrintStub } from "../support/label-print-stub";
import { form, jsonRequest, params } from "../support/matrix";
import { darkLines, darkRecipe, referenceIds } from "../support/recipe-fixtures";
import { freshRequest } from "../support/request";

let team: TeamFixture;
let stub: PrintStub;
const viewerOf = (role: "formulator" | "production" | "buyer", t = team): Viewer => ({
  user: { id: t.people[role].id, email: t.people[role].email, name: t.people[role].name },
  workspace: { id: t.workspaceId, name: "test" },
  role,
});

beforeAll(async () => {
  team = await createTeam("labels");
  stub = await startPrintStub();
  process.env.BARWRIGHT_INTERNAL_ORIGIN = stub.origin;
});
afterAll(async () => {
  delete process.env.BARWRIGHT_INTERNAL_ORIGIN;
  await stub.close();
});
beforeEach(() => freshRequest());

describe("loadLabel", () => {
  it("computes the label of v1 of the classic 70 % dark (64 nibs, 7.3 cocoa butter, 28.4 sugar, 0.3 lecithin)", async () => {
    const recipeId = await darkRecipe(team);
    const { version, view } = await loadLabel({ viewer: viewerOf("formulator"), recipeId });
    expect(version.versionNo).toBe(1);
    // Per 100 g (nibs from lib/formulation/reference/label-nutrients.ts, see tests/unit/nutrition):
    // fat 35.2 + 7.3 + 0.3 = 42.8 → 43 g; saturates 21.0176 + 4.3581 + 0.04503 = 25.42073 → 25 g;
    // carbohydrate 16.832 + 28.39432 − fibre 9.856 = 35.37032 → 35 g; sugars 0.5376 + 28.37444 = 28.91204 → 29 g;
    // protein 8.5056 → 8.5 g; salt 0.035648 + 0.00071 = 0.036358 → 0.04 g.
    // kJ 37 × 42.8 + 17 × 35.37032 + 17 × 8.5056 + 8 × 9.856 = 2408.33864; kcal 580.41568
    // (Regulation (EU) No 1169/2011 Annex XIV; EC rounding guidance Dec 2012, from memory).
    expect(view.eu.rows.map((r) => r.per100g)).toEqual(["2408 kJ / 580 kcal", "43 g", "25 g", "35 g", "29 g", "9.9 g", "8.5 g", "0.04 g"]);
    // US: 70 g bar = 233 % of the 30 g reference amount → 1/2 bar, dual columns (21 CFR 101.9(b)(12)(i));
    // per 35 g 4 × 2.97696 + 4 × 15.829212 + 9 × 14.98 = 210.04 → 210 kcal; per bar 420.09 → 420.
    expect([view.us.panel?.servingSize, view.us.panel?.servingsPerContainer, view.us.panel?.calories]).toEqual(["1/2 bar (35g)", "2", { perServing: "210", perPackage: "420" }]);
    expect(view.statement.eu.map((i) => i.name)).toEqual(["cocoa nibs", "sugar", "cocoa butter", "emulsifier (soya lecithin)"]);
    expect(view.solids.cocoa).toBe("cocoa solids: 70 % minimum");
    expect(view.allergens.usContains).toBe("Contains: Soy.");
    // The library rows made from reference profiles lack saturates and salt: taken from the profiles, and said so.
    expect(view.fallbacks.find((f) => f.ingredient === "Cocoa nibs (roasted)")?.nutrients).toEqual(["saturates", "carbohydrate", "sugars", "fibre", "protein", "salt"]);
    expect(view.gaps).toEqual([]);
  });

  it("prefers the library's own figure to the reference profile", async () => {
    const recipeId = await darkRecipe(team);
    const ids = await referenceIds(team.workspaceId);
    await db.update(ingredients).set({ saturatedFat: "40" }).where(and(eq(ingredients.id, ids.nibs), eq(ingredients.workspaceId, team.workspaceId)));
    try {
      const { view } = await loadLabel({ viewer: viewerOf("formulator"), recipeId });
      // saturates 0.64 × 40 + 4.3581 + 0.04503 = 30.00313 → 30 g.
      expect(view.eu.rows.find((r) => r.key === "saturates")?.per100g).toBe("30 g");
      expect(view.fallbacks.find((f) => f.ingredient === "Cocoa nibs (roasted)")?.nutrients).not.toContain("saturates");
    } finally {
      await db.update(ingredients).set({ saturatedFat: null }).where(eq(ingredients.id, ids.nibs));
    }
  });

  it("reports an ingredient without figures as a gap", async () => {
    const recipeId = await darkRecipe(team);
    const ids = await referenceIds(team.workspaceId);
    await saveRecipeVersion({ workspaceId: team.workspaceId, authorId: null, recipeId, baseVersionNo: 1, barMassGrams: "70", lines: [...darkLines(ids, "64").map((l) => (l.ingredientId === ids.sugar ? { ...l, percent: "28.3" } : l)), { ingredientId: ids.vanilla, percent: "0.1" }] });
    const { view } = await loadLabel({ viewer: viewerOf("formulator"), recipeId, versionNo: 2 });
    expect(view.gaps).toEqual([{ ingredient: "Vanilla (ground pods)", nutrients: ["fat", "saturates", "carbohydrate", "sugars", "fibre", "protein", "salt"] }]);
  });

  it("shows the released version by default and keeps production to released ones", async () => {
    const recipeId = await darkRecipe(team);
    const ids = await referenceIds(team.workspaceId);
    await releaseVersion({ workspaceId: team.workspaceId, userId: null, recipeId, versionNo: 1 });
    await saveRecipeVersion({ workspaceId: team.workspaceId, authorId: null, recipeId, baseVersionNo: 1, barMassGrams: "70", lines: darkLines(ids, "66") });
    expect((await loadLabel({ viewer: viewerOf("formulator"), recipeId })).version.versionNo).toBe(1);
    expect((await loadLabel({ viewer: viewerOf("production"), recipeId })).version.versionNo).toBe(1);
    await expect(loadLabel({ viewer: viewerOf("production"), recipeId, versionNo: 2 })).rejects.toMatchObject({ code: "forbidden" });
    expect((await loadLabel({ viewer: viewerOf("buyer"), recipeId, versionNo: 2 })).version.versionNo).toBe(2);
  });

  it("finds nothing for another workspace's recipe", async () => {
    const other = await createTeam("labels-other");
    const recipeId = await darkRecipe(team);
    const err = await loadLabel({ viewer: viewerOf("formulator", other), recipeId }).catch((e: unknown) => e);
    expect(err).toBeInstanceOf(AppError);
    expect((err as AppError).code).toBe("not_found");
  });
});

describe("saveLabelSettingsAction", () => {
  it("stores the settings, and the label uses them", async () => {
    const recipeId = await darkRecipe(team);
    await signInAs(team.people.formulator.id, team.workspaceId);
    const result = await saveLabelSettingsAction(null, form({ recipeId, mayContain: " milk, hazelnuts ", piecesPerBar: "12", euPortionGrams: "25.0" }));
    expect(result).toMatchObject({ ok: true, data: { mayContain: "milk, hazelnuts", piecesPerBar: 12, euPortionGrams: "25" } });
    const { view } = await loadLabel({ viewer: viewerOf("formulator"), recipeId });
    expect(view.mayContain).toBe("milk, hazelnuts");
    // 12 pieces of 5.83 g: 5 pieces = 29.17 g closest to 30 g; 12 / 5 = 2.4 → "about 2.5" (21 CFR 101.9(b)(2)(i), (b)(8)(i)).
    expect([view.us.panel?.servingSize, view.us.panel?.servingsPerContainer]).toEqual(["5 pieces (29g)", "about 2.5"]);
    // Per 25 g: energy 2408.33864 × 0.25 = 602.08 kJ → 602; 580.41568 × 0.25 = 145.10 kcal → 145; % RI 602.08 / 8400 = 7.2 → 7.
    expect(view.eu.rows[0]).toMatchObject({ perPortion: "602 kJ / 145 kcal", referenceIntakePercent: "7" });
    expect(view.eu.portionGrams).toBe("25");
  });

  it("refuses bad values with a message per field and keeps the last good ones", async () => {
    const recipeId = await darkRecipe(team);
    await signInAs(team.people.owner.id, team.workspaceId);
    await saveLabelSettingsAction(null, form({ recipeId, mayContain: "sesame", piecesPerBar: "", euPortionGrams: "" }));
    const result = await saveLabelSettingsAction(null, form({ recipeId, mayContain: "x".repeat(301), piecesPerBar: "2.5", euPortionGrams: "-3" }));
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(Object.keys(result.fieldErrors ?? {}).sort()).toEqual(["euPortionGrams", "mayContain", "piecesPerBar"]);
    expect(result.fieldErrors?.piecesPerBar).toEqual(["Enter the number of pieces as a whole number, like 12."]);
    expect(await getLabelSettings({ workspaceId: team.workspaceId, recipeId })).toMatchObject({ mayContain: "sesame", piecesPerBar: null, euPortionGrams: null });
  });
});

describe("GET /api/labels/:recipeId", () => {
  const get = (recipeId: string, query: string) => getLabelFile(jsonRequest("GET", `/api/labels/${recipeId}?${query}`), params({ recipeId }));

  it("prints a PDF of the label's print page as the same user", async () => {
    const recipeId = await darkRecipe(team);
    const token = await signInAs(team.people.formulator.id, team.workspaceId);
    const response = await get(recipeId, "format=pdf&paper=letter");
    expect(response.status).toBe(200);
    expect(response.headers.get("content-type")).toBe("application/pdf");
    expect(response.headers.get("content-disposition")).toMatch(/^attachment; filename="label-dark-[0-9a-f]{6}-v1\.pdf"$/);
    expect(Buffer.from(await response.arrayBuffer()).subarray(0, 5).toString()).toBe("%PDF-");
    const asked = stub.requests.filter((r) => r.url.startsWith(`/print/labels/${recipeId}`));
    expect(asked.map((r) => r.url)).toEqual([`/print/labels/${recipeId}?version=1&paper=letter`]);
    expect(asked[0]!.cookie).toContain(token);
  });

  it("gives a PNG of the label", async () => {
    const recipeId = await darkRecipe(team);
    await signInAs(team.people.viewer.id, team.workspaceId);
    const response = await get(recipeId, "format=png");
    expect(response.headers.get("content-type")).toBe("image/png");
    // PNG signature: 89 50 4E 47 0D 0A 1A 0A.
    expect([...Buffer.from(await response.arrayBuffer()).subarray(0, 8)]).toEqual([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);
  });

  it("answers 422 for an unknown format, 404 for a version that does not exist, 403 for production on an unreleased one", async () => {
    const recipeId = await darkRecipe(team);
    await signInAs(team.people.formulator.id, team.workspaceId);
    expect((await get(recipeId, "format=svg")).status).toBe(422);
    expect((await get(recipeId, "version=9")).status).toBe(404);
    freshRequest();
    await signInAs(team.people.production.id, team.workspaceId);
    expect((await get(recipeId, "version=1")).status).toBe(403);
  });
});
