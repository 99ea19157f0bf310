import { GET as getComparison } from "@/app/api/costing/[recipeId]/comparison/route";
import { pickSupplierAction, resetPicksAction, saveCostSettingsAction, setCostVisibilityAction } from "@/app/(app)/costing/actions";
import { costedRecipe, settingsForm } from "../support/costing";
import { base, fromResult, fromStatus, params, runMatrix, type MatrixRow } from "../support/matrix";

// Rights: the issue's role rules ("buyer and owner see and edit cost settings; formulator sees costs;
// production and viewer do not see prices unless the owner allows it") — product rule, no outside source.
// The owner's setting is off in these rows, so production and viewers are refused.
const rows: MatrixRow[] = [
  {
    name: "saveCostSettingsAction",
    permission: "costs.edit",
    outsider: "not_found",
    run: async ({ team }) => {
      const { recipeId } = await costedRecipe(team);
      return fromResult(await saveCostSettingsAction(settingsForm(recipeId, { packagingPerBar: "0.32", barsPerCase: "12" })));
    },
  },
  {
    name: "pickSupplierAction",
    permission: "costs.edit",
    outsider: "not_found",
    run: async ({ team }) => {
      const { recipeId, ids, suppliers } = await costedRecipe(team);
      return fromResult(await pickSupplierAction({ recipeId, ingredientId: ids.sugar, source: `supplier:${suppliers.fine.id}` }));
    },
  },
  {
    name: "resetPicksAction",
    permission: "costs.edit",
    outsider: "not_found",
    run: async ({ team }) => {
      const { recipeId } = await costedRecipe(team);
      return fromResult(await resetPicksAction({ recipeId }));
    },
  },
  {
    name: "setCostVisibilityAction (off)",
    permission: "members.manage",
    outsider: "ok", // changes the caller's own workspace only
    run: async () => fromResult(await setCostVisibilityAction({ show: false })),
  },
  {
    name: "GET /api/costing/:recipeId/comparison",
    permission: "costs.read",
    outsider: "not_found",
    run: async ({ team }) => {
      const { recipeId } = await costedRecipe(team);
      return fromStatus((await getComparison(new Request(`${base}/api/costing/${recipeId}/comparison`), params({ recipeId }))).status);
    },
  },
];

runMatrix("costing", rows);
