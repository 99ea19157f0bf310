import "server-only";
import { and, desc, eq } from "drizzle-orm";
import { db } from "@/db/client";
import { recipeReleases, recipes, users } from "@/db/schema";
import { conflict } from "@/lib/errors";
import { inTransaction, type Executor } from "./recipes-db";
import { lockRecipe } from "./recipes";
import { getVersion } from "./recipes-versions";

/**
 * Releases a version for production: appends a release record and makes it the
 * recipe's current release. Releasing an older version again is allowed (a
 * step back); releasing the current one again is refused.
 */
export async function releaseVersion({
  workspaceId,
  userId,
  recipeId,
  versionNo,
  note,
  executor,
}: {
  workspaceId: string;
  userId: string | null;
  recipeId: string;
  versionNo: number;
  note?: string;
  executor?: Executor;
}): Promise<void> {
  await inTransaction(executor, async (tx) => {
    const recipe = await lockRecipe(tx, { workspaceId, recipeId });
    const version = await getVersion({ workspaceId, recipeId, versionNo, executor: tx });
    if (recipe.releasedVersionNo === versionNo) throw conflict(`v${versionNo} is already the released version.`);
    const [release] = await tx
      .insert(recipeReleases)
      .values({ workspaceId, recipeId, versionId: version.id, versionNo, note: note ?? null, releasedById: userId })
      .returning({ createdAt: recipeReleases.createdAt });
    await tx
      .update(recipes)
      .set({ releasedVersionNo: versionNo, releasedAt: release!.createdAt })
      .where(and(eq(recipes.workspaceId, workspaceId), eq(recipes.id, recipeId)));
  });
}

export type ReleaseRecord = { versionNo: number; note: string | null; releasedByName: string | null; createdAt: Date };

/** The recipe's release records, newest first. */
export async function listReleases({ workspaceId, recipeId }: { workspaceId: string; recipeId: string }): Promise<ReleaseRecord[]> {
  return db
    .select({ versionNo: recipeReleases.versionNo, note: recipeReleases.note, releasedByName: users.name, createdAt: recipeReleases.createdAt })
    .from(recipeReleases)
    .leftJoin(users, eq(users.id, recipeReleases.releasedById))
    .where(and(eq(recipeReleases.workspaceId, workspaceId), eq(recipeReleases.recipeId, recipeId)))
    .orderBy(desc(recipeReleases.createdAt));
}
