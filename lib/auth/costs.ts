import "server-only";
import { cache } from "react";
import { getShowCostsToAll } from "@/lib/data/cost-visibility";
import { forbidden } from "@/lib/errors";
import { authorize } from "./authorize";
import type { Viewer } from "./current";
import { can } from "./permissions";

/**
 * The one place that decides who sees costs: the roles holding costs.read
 * (owner, buyer, formulator), plus production and viewers when the owner has
 * turned on the workspace's "show costs to everyone" setting. The permission
 * table itself stays deny-by-default for them. Read once per request.
 */
export const canSeeCosts = cache(async (viewer: Viewer): Promise<boolean> => {
  if (can(viewer.role, "costs.read")) return true;
  return getShowCostsToAll({ workspaceId: viewer.workspace.id });
});

/** For route handlers and services: the viewer may see costs, or a 403. */
export async function requireCostReader(viewer: Viewer): Promise<void> {
  if (!(await canSeeCosts(viewer))) throw forbidden("see costs and prices");
}

/** The signed-in viewer allowed to see costs (401 / 403 otherwise). */
export async function authorizeCostReader(): Promise<Viewer> {
  const viewer = await authorize("workspace.read");
  await requireCostReader(viewer);
  return viewer;
}
