import "server-only";
import { canSeeCosts } from "@/lib/auth/costs";
import type { Viewer } from "@/lib/auth/current";
import { can } from "@/lib/auth/permissions";
import {
  getBeansOnHand,
  getSetupProgress,
  listOpenPurchaseOrders,
  listPlannedBatches,
  listQuotesToCheck,
  listReleasedMargins,
  listUnreleasedChanges,
  type BeansOnHand,
  type Few,
  type OpenOrder,
  type PlannedBatch,
  type QuoteToCheck,
  type ReleasedMargin,
  type SetupProgress,
  type UnreleasedRecipe,
} from "@/lib/data/overview";

/**
 * The overview of one viewer: each part is null when the role has no use for
 * it or may not see it. Margins only for those who may see costs (the owner's
 * "show costs to everyone" setting included); recipes saved since their
 * release only for roles that read every version; prices to chase only for those who
 * enter quotes. Batches, orders and beans are everyone's (batches.read,
 * lots.read). `setup` is the checklist of first steps, for whoever
 * manages the workspace's people (the owner), while any step is left. No money outside `margins`.
 */
export type Overview = {
  on: string;
  setup: SetupProgress | null;
  margins: Few<ReleasedMargin> | null;
  batches: Few<PlannedBatch>;
  orders: Few<OpenOrder>;
  beans: BeansOnHand;
  unreleased: Few<UnreleasedRecipe> | null;
  quotes: Few<QuoteToCheck> | null;
};

export async function getOverviewForViewer({ viewer, on }: { viewer: Viewer; on: string }): Promise<Overview> {
  const workspaceId = viewer.workspace.id;
  const costsShown = await canSeeCosts(viewer);
  const [setup, margins, batches, orders, beans, unreleased, quotes] = await Promise.all([
    can(viewer.role, "members.manage") ? getSetupProgress({ workspaceId }).then((steps) => (steps.every((s) => s.done) ? null : steps)) : null,
    costsShown ? listReleasedMargins({ workspaceId, on }) : null,
    listPlannedBatches({ workspaceId, on }),
    listOpenPurchaseOrders({ workspaceId }),
    getBeansOnHand({ workspaceId }),
    can(viewer.role, "recipes.read") ? listUnreleasedChanges({ workspaceId }) : null,
    can(viewer.role, "suppliers.edit") ? listQuotesToCheck({ workspaceId, on }) : null,
  ]);
  return { on, setup, margins, batches, orders, beans, unreleased, quotes };
}
