import { eq, inArray } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { db } from "@/db/client";
import { recipeVersionLines, recipeVersions } from "@/db/schema";
import { exportWorkspace, exportWorkspaceChunks } from "@/lib/workspace-transfer/export";
import { EXPORTED_TABLES } from "@/lib/workspace-transfer/tables";
import { createTeam, type TeamFixture } from "../support/fixtures";
import { makeIngredient, makeSupplier } from "../support/ingredients";
import { darkRecipe } from "../support/recipe-fixtures";
import type { Doc } from "../support/workspace-transfer";

let mine: TeamFixture;
let theirs: TeamFixture;

async function fill(team: TeamFixture, label: string) {
  await makeSupplier(team.workspaceId, { name: `${label} Bean Importers` });
  await makeIngredient(team.workspaceId, { name: `${label} cane sugar` });
  await darkRecipe(team, `${label} dark 70`);
}

beforeAll(async () => {
  mine = await createTeam("scope-mine");
  theirs = await createTeam("scope-theirs");
  await fill(mine, "Ashcombe");
  await fill(theirs, "Orvalle");
});

describe("a workspace export", () => {
  it("never contains another workspace's rows, people or names", async () => {
    const text = await exportWorkspace({ workspaceId: mine.workspaceId, includeFiles: true });
    const doc = JSON.parse(text) as Doc;
    for (const table of EXPORTED_TABLES) {
      if (!table.workspaceKey) continue;
      for (const row of doc.tables[table.name]!) expect(row[table.workspaceKey], table.name).toBe(mine.workspaceId);
    }
    const other = JSON.parse(await exportWorkspace({ workspaceId: theirs.workspaceId, includeFiles: true })) as Doc;
    const theirIds = [theirs.workspaceId, ...Object.values(other.tables).flatMap((rows) => rows.map((r) => String(r.id ?? r.recipeId)))];
    expect(theirIds.filter((id) => text.includes(id))).toEqual([]);
    expect(text).not.toMatch(/Orvalle|scope-theirs/);
    expect(doc.people.map((p) => p.email).sort()).toEqual(Object.values(mine.people).map((p) => p.email).sort());
  });

  it("carries the line tables (no workspace column) through their parents, all of them and only them", async () => {
    const doc = JSON.parse(await exportWorkspace({ workspaceId: mine.workspaceId, includeFiles: true })) as Doc;
    const versions = await db.select({ id: recipeVersions.id }).from(recipeVersions).where(eq(recipeVersions.workspaceId, mine.workspaceId));
    const lines = await db.select({ id: recipeVersionLines.id }).from(recipeVersionLines).where(inArray(recipeVersionLines.versionId, versions.map((v) => v.id)));
    expect(lines.length).toBeGreaterThan(0);
    expect(doc.tables.recipe_version_lines!.map((r) => r.id).sort()).toEqual(lines.map((l) => l.id).sort());
  });

  it("gives its database connection back when a download is abandoned half-way", async () => {
    // More abandoned downloads than the pool has connections (10): a leak would hang the last export.
    for (let i = 0; i < 12; i++) {
      const chunks = exportWorkspaceChunks({ workspaceId: mine.workspaceId, includeFiles: true });
      await chunks.next();
      await chunks.return(undefined);
    }
    expect(JSON.parse(await exportWorkspace({ workspaceId: mine.workspaceId, includeFiles: true }))).toHaveProperty("tables");
  });
});
