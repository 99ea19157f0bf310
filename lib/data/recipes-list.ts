import "server-only";
import { and, asc, count, desc, eq, ilike, isNotNull, isNull, sql, type SQL } from "drizzle-orm";
import { db } from "@/db/client";
import type { AnyPgColumn } from "drizzle-orm/pg-core";
import { recipes, recipeVersions, type ChocolateType } from "@/db/schema";
import { DEFAULT_DIRECTION } from "@/lib/recipes/list-defaults";
import type { RecipeListQuery } from "@/lib/validation/recipes";

export type RecipeListRow = {
  id: string;
  name: string;
  chocolateType: ChocolateType;
  targetCocoaPercent: string | null;
  /** The version the figures belong to: the latest, or the released one for production. */
  versionNo: number;
  releasedVersionNo: number | null;
  cocoaPercent: string | null;
  costPerBar: string | null;
  updatedAt: Date;
};

export type RecipeListPage = { rows: RecipeListRow[]; total: number; page: number; pageSize: number; pageCount: number };


/** `%` and `_` typed by a person are literal characters, not wildcards. */
const likePattern = (q: string) => `%${q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;

/**
 * One page of the workspace's recipes. Everything it filters and sorts on is a
 * column of `recipes` with an index led by workspace_id (figures copied from
 * the latest version at save), so a page costs the same with 10,000 recipes.
 * `releasedOnly` (production) lists released recipes with the released
 * version's figures instead.
 */
export async function listRecipes({
  workspaceId,
  query,
  releasedOnly = false,
}: {
  workspaceId: string;
  query: RecipeListQuery;
  releasedOnly?: boolean;
}): Promise<RecipeListPage> {
  const filters: SQL[] = [eq(recipes.workspaceId, workspaceId)];
  if (query.q) filters.push(ilike(recipes.name, likePattern(query.q)));
  if (query.type) filters.push(eq(recipes.chocolateType, query.type));
  if (query.status === "released" || releasedOnly) filters.push(isNotNull(recipes.releasedVersionNo));
  if (query.status === "draft") filters.push(isNull(recipes.releasedVersionNo));
  const where = and(...filters);

  // Production sees the released version's figures (a join on the page's rows), never the latest's.
  const cocoa = releasedOnly ? recipeVersions.cocoaPercent : recipes.cocoaPercent;
  const cost = releasedOnly ? recipeVersions.costPerBar : recipes.costPerBar;
  const dir = query.dir ?? DEFAULT_DIRECTION[query.sort];
  const order = dir === "asc" ? asc : desc;
  const nullsLast = (column: AnyPgColumn) => sql`${column} ${sql.raw(dir)} nulls last`;
  const orderBy: SQL[] = {
    name: [order(sql`lower(${recipes.name})`)],
    updated: [order(recipes.updatedAt)],
    cocoa: [nullsLast(cocoa)],
    cost: [nullsLast(cost)],
  }[query.sort];

  const base = db
    .select({
      id: recipes.id,
      name: recipes.name,
      chocolateType: recipes.chocolateType,
      targetCocoaPercent: recipes.targetCocoaPercent,
      versionNo: releasedOnly ? sql<number>`coalesce(${recipes.releasedVersionNo}, 0)` : recipes.latestVersionNo,
      releasedVersionNo: recipes.releasedVersionNo,
      cocoaPercent: cocoa,
      costPerBar: cost,
      updatedAt: recipes.updatedAt,
    })
    .from(recipes);
  const joined = releasedOnly
    ? base.leftJoin(recipeVersions, and(eq(recipeVersions.recipeId, recipes.id), eq(recipeVersions.versionNo, recipes.releasedVersionNo)))
    : base;
  const [rows, [{ total } = { total: 0 }]] = await Promise.all([
    joined
      .where(where)
      .orderBy(...orderBy, order(recipes.id))
      .limit(query.pageSize)
      .offset((query.page - 1) * query.pageSize),
    db.select({ total: count() }).from(recipes).where(where),
  ]);
  return { rows, total, page: query.page, pageSize: query.pageSize, pageCount: Math.max(1, Math.ceil(total / query.pageSize)) };
}
