import "server-only";
import { notFound } from "next/navigation";
import { cache } from "react";
import { canSeeCosts } from "@/lib/auth/costs";
import { requireViewer } from "@/lib/auth/current";
import { can } from "@/lib/auth/permissions";
import { loadRecipeCosting } from "@/lib/data/costing";
import { AppError } from "@/lib/errors";
import { isoDay } from "@/lib/pricing/convert";
import { costingQuerySchema } from "@/lib/validation/costing";
import { recipeIdSchema } from "@/lib/validation/recipes";

/**
 * The viewer and the costing of /costing/[recipeId]?version=N, once per
 * request; null costing when the viewer may not see costs. A malformed id or
 * version, another workspace's recipe or a recipe with no version is a 404.
 */
export const loadCostingPage = cache(async (recipeIdParam: string, versionParam: string | string[] | undefined) => {
  const viewer = await requireViewer();
  if (!(await canSeeCosts(viewer))) return { viewer, costing: null, canEdit: false };
  const id = recipeIdSchema.safeParse(recipeIdParam);
  const query = costingQuerySchema.safeParse(versionParam === undefined ? {} : { version: Array.isArray(versionParam) ? versionParam[0] : versionParam });
  if (!id.success || !query.success) notFound();
  const costing = await loadRecipeCosting({ workspaceId: viewer.workspace.id, recipeId: id.data, versionNo: query.data.version, on: isoDay(new Date()), releasedOnly: !can(viewer.role, "recipes.read") }).catch((err: unknown) => {
    if (err instanceof AppError && err.code === "not_found") notFound();
    throw err;
  });
  return { viewer, costing, canEdit: can(viewer.role, "costs.edit") };
});
