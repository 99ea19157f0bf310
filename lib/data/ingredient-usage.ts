import "server-only";
import { and, asc, eq } from "drizzle-orm";
import type { DemoContext } from "@/db/demo/context";
import { recipes, recipeVersionLines, recipeVersions } from "@/db/schema";

/**
 * The names of the workspace's recipes with any saved version that uses the
 * ingredient (versions are kept forever, so an old version counts too).
 */
export async function findRecipesUsingIngredient({
  tx,
  workspaceId,
  ingredientId,
}: {
  tx: DemoContext["tx"];
  workspaceId: string;
  ingredientId: string;
}): Promise<string[]> {
  const rows = await tx
    .selectDistinct({ name: recipes.name })
    .from(recipeVersionLines)
    .innerJoin(recipeVersions, eq(recipeVersions.id, recipeVersionLines.versionId))
    .innerJoin(recipes, eq(recipes.id, recipeVersions.recipeId))
    .where(and(eq(recipeVersionLines.ingredientId, ingredientId), eq(recipes.workspaceId, workspaceId)))
    .orderBy(asc(recipes.name));
  return rows.map((r) => r.name);
}
