import "server-only";
import { and, asc, desc, eq, exists, sql } from "drizzle-orm";
import { db } from "@/db/client";
import { recipeReleases, recipeVersionLines, recipeVersions, users } from "@/db/schema";
import type { Evaluation } from "@/lib/formulation";
import { notFound } from "@/lib/errors";
import type { VersionLine } from "@/lib/recipes/types";
import type { Executor } from "./recipes-db";

export type VersionSummary = {
  id: string;
  versionNo: number;
  basedOnVersionNo: number | null;
  restoredFromVersionNo: number | null;
  note: string | null;
  authorName: string | null;
  createdAt: Date;
  barMassGrams: string;
  cocoaPercent: string;
  costPerKg: string | null;
  costPerBar: string | null;
  /** Released at least once. */
  released: boolean;
};

export type VersionDetail = VersionSummary & { recipeId: string; lines: VersionLine[]; evaluation: Evaluation };

const everReleased = (executor: Executor) =>
  exists(executor.select({ one: sql`1` }).from(recipeReleases).where(eq(recipeReleases.versionId, recipeVersions.id)));

function summaryColumns(executor: Executor) {
  return {
    id: recipeVersions.id,
    recipeId: recipeVersions.recipeId,
    versionNo: recipeVersions.versionNo,
    basedOnVersionNo: recipeVersions.basedOnVersionNo,
    restoredFromVersionNo: recipeVersions.restoredFromVersionNo,
    note: recipeVersions.note,
    authorName: users.name,
    createdAt: recipeVersions.createdAt,
    barMassGrams: recipeVersions.barMassGrams,
    cocoaPercent: recipeVersions.cocoaPercent,
    costPerKg: recipeVersions.costPerKg,
    costPerBar: recipeVersions.costPerBar,
    released: everReleased(executor).mapWith(Boolean),
  };
}

/** The recipe's versions, newest first; only released ones when asked (what production may see). */
export async function listVersions({
  workspaceId,
  recipeId,
  releasedOnly = false,
  executor = db,
}: {
  workspaceId: string;
  recipeId: string;
  releasedOnly?: boolean;
  executor?: Executor;
}): Promise<VersionSummary[]> {
  const scope = and(eq(recipeVersions.workspaceId, workspaceId), eq(recipeVersions.recipeId, recipeId));
  const rows = await executor
    .select(summaryColumns(executor))
    .from(recipeVersions)
    .leftJoin(users, eq(users.id, recipeVersions.authorId))
    .where(releasedOnly ? and(scope, everReleased(executor)) : scope)
    .orderBy(desc(recipeVersions.versionNo));
  return rows.map(({ recipeId: _r, ...row }) => row);
}

/** One version with its lines as they were saved, or not_found. */
export async function getVersion({
  workspaceId,
  recipeId,
  versionNo,
  executor = db,
}: {
  workspaceId: string;
  recipeId: string;
  versionNo: number;
  executor?: Executor;
}): Promise<VersionDetail> {
  const [row] = await executor
    .select({ ...summaryColumns(executor), evaluation: recipeVersions.evaluation })
    .from(recipeVersions)
    .leftJoin(users, eq(users.id, recipeVersions.authorId))
    .where(and(eq(recipeVersions.workspaceId, workspaceId), eq(recipeVersions.recipeId, recipeId), eq(recipeVersions.versionNo, versionNo)));
  if (!row) throw notFound(`Version v${versionNo}`);
  const lines = await executor
    .select({
      ingredientId: recipeVersionLines.ingredientId,
      percent: recipeVersionLines.percent,
      name: recipeVersionLines.ingredientName,
      cocoaButter: recipeVersionLines.cocoaButter,
      cocoaSolidsNonFat: recipeVersionLines.cocoaSolidsNonFat,
      milkFat: recipeVersionLines.milkFat,
      milkSolidsNonFat: recipeVersionLines.milkSolidsNonFat,
      sugar: recipeVersionLines.sugar,
      vegetableFat: recipeVersionLines.vegetableFat,
      moisture: recipeVersionLines.moisture,
      isInclusion: recipeVersionLines.isInclusion,
      allergens: recipeVersionLines.allergens,
      pricePerKg: recipeVersionLines.pricePerKg,
    })
    .from(recipeVersionLines)
    .where(eq(recipeVersionLines.versionId, row.id))
    .orderBy(asc(recipeVersionLines.position));
  return { ...row, evaluation: row.evaluation as Evaluation, lines };
}

/** The version numbers the recipe has, oldest first (to check there are no gaps). */
export async function listVersionNumbers({ workspaceId, recipeId }: { workspaceId: string; recipeId: string }): Promise<number[]> {
  const rows = await db
    .select({ n: recipeVersions.versionNo })
    .from(recipeVersions)
    .where(and(eq(recipeVersions.workspaceId, workspaceId), eq(recipeVersions.recipeId, recipeId)))
    .orderBy(asc(recipeVersions.versionNo));
  return rows.map((r) => r.n);
}
