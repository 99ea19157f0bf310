import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { db } from "@/db/client";
import { recipes } from "@/db/schema";
import { seedDemo } from "@/db/seed";
import { listReleases } from "@/lib/data/recipes-releases";
import { getVersion, listVersionNumbers } from "@/lib/data/recipes-versions";

describe("the demo recipes", () => {
  it("seed five recipes with several versions each, some released, computed like real saves, and only once", async () => {
    const { workspaceId } = await seedDemo(db);
    await seedDemo(db);
    const rows = await db.select().from(recipes).where(eq(recipes.workspaceId, workspaceId)).orderBy(recipes.name);
    expect(rows.map((r) => [r.name, r.chocolateType, r.latestVersionNo, r.releasedVersionNo])).toEqual([
      ["Deep dark 82 %", "dark", 2, 2],
      ["Harbour milk 45 %", "milk", 3, 2],
      ["Hazelnut dark, 15 % roasted hazelnuts", "dark", 2, 1],
      ["House dark 70 %", "dark", 3, 2],
      ["Quayside white 34 %", "white", 2, 1],
    ]);
    for (const r of rows) {
      expect(await listVersionNumbers({ workspaceId, recipeId: r.id })).toEqual(Array.from({ length: r.latestVersionNo }, (_, i) => i + 1));
      expect((await listReleases({ workspaceId, recipeId: r.id }))[0]!.versionNo).toBe(r.releasedVersionNo);
    }
    const house = rows.find((r) => r.name === "House dark 70 %")!;
    const v2 = await getVersion({ workspaceId, recipeId: house.id, versionNo: 2 });
    // 64 % nibs (98 % dry cocoa solids) + 7.3 % cocoa butter = 70.02 %: the engine's figure, stored at "save".
    expect(v2.evaluation.composition.totalDryCocoaSolids).toBe("70.02");
    expect(v2.authorName).toBe("Theo Brandt");
    const nuts = rows.find((r) => r.name.startsWith("Hazelnut"))!;
    const v1 = await getVersion({ workspaceId, recipeId: nuts.id, versionNo: 1 });
    expect(v1.evaluation.composition.inclusions).toBe("15");
    // The standards deduct the 15 % of nuts: (57 × 0.98 + 6) / 85 = 72.78 % on the EU basis (Directive 2000/36/EC Annex I notes).
    expect(Number(v1.evaluation.bases.eu.totalDryCocoaSolids)).toBeCloseTo(72.776, 3);
  });
});
