import "server-only";
import { and, asc, eq, isNotNull, sql } from "drizzle-orm";
import { db } from "@/db/client";
import { recipes, recipeVersions, type ChocolateType } from "@/db/schema";
import { plain } from "./numeric";

export type ReleasedRecipeChoice = {
  id: string;
  name: string;
  chocolateType: ChocolateType;
  releasedVersionNo: number;
  barMassGrams: string;
};

/** Recipes production may plan from: each with its current released version (name order). */
export async function listReleasedRecipes({ workspaceId, limit = 500 }: { workspaceId: string; limit?: number }): Promise<ReleasedRecipeChoice[]> {
  const rows = await db
    .select({
      id: recipes.id,
      name: recipes.name,
      chocolateType: recipes.chocolateType,
      releasedVersionNo: recipes.releasedVersionNo,
      barMassGrams: recipeVersions.barMassGrams,
    })
    .from(recipes)
    .innerJoin(recipeVersions, and(eq(recipeVersions.recipeId, recipes.id), eq(recipeVersions.versionNo, recipes.releasedVersionNo)))
    .where(and(eq(recipes.workspaceId, workspaceId), isNotNull(recipes.releasedVersionNo)))
    .orderBy(asc(sql`lower(${recipes.name})`))
    .limit(limit);
  return rows.map((r) => ({ ...r, releasedVersionNo: r.releasedVersionNo!, barMassGrams: plain(r.barMassGrams) }));
}
