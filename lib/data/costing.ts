import "server-only";
import { buildCostingReport, DEFAULT_COST_SETTINGS, type CostingReport, type CostLine, type CostSettings } from "@/lib/costing";
import { notFound } from "@/lib/errors";
import { toIngredientSpec } from "@/lib/recipes/engine-lines";
import { getCostSettings, type CostSettingsRecord } from "./cost-settings";
import { listPicks } from "./cost-picks";
import { listIngredientSources } from "./cost-sources";
import { getRecipe, type RecipeRecord } from "./recipes";
import { getVersion, listVersionNumbers, listVersions, type VersionDetail } from "./recipes-versions";

export type RecipeCosting = {
  recipe: Pick<RecipeRecord, "id" | "name" | "chocolateType" | "latestVersionNo">;
  version: Pick<VersionDetail, "versionNo" | "note" | "barMassGrams" | "createdAt" | "released"> & { composition: VersionDetail["evaluation"]["composition"] };
  versionNumbers: number[];
  baseCurrency: string;
  /** The day prices were read for (quotes valid that day, that day's exchange rates). */
  on: string;
  settingsRecord: CostSettingsRecord;
  /** The settings costed with: the recipe's, or the defaults when those were entered in another currency. */
  settings: CostSettings;
  /** Set when the settings were entered in a currency that is no longer the base currency. */
  currencyProblem: string | null;
  lines: CostLine[];
  report: CostingReport;
};

/**
 * The buyer's costing of one version of a recipe (`versionNo`, or the latest)
 * on day `on`: its lines with every current source of each ingredient, the
 * recipe's cost settings and picks, and the report the engine computes from
 * them (lib/costing). Reads only. A recipe without a saved version is not found.
 * `releasedOnly` (roles that read released versions only, i.e. production when
 * the owner shares costs) defaults to the released version and refuses others.
 */
export async function loadRecipeCosting({
  workspaceId,
  recipeId,
  versionNo,
  on,
  releasedOnly = false,
}: {
  workspaceId: string;
  recipeId: string;
  versionNo?: number;
  on: string;
  releasedOnly?: boolean;
}): Promise<RecipeCosting> {
  const recipe = await getRecipe({ workspaceId, recipeId });
  const wanted = versionNo ?? (releasedOnly ? recipe.releasedVersionNo : recipe.latestVersionNo);
  if (!wanted) throw notFound(releasedOnly ? "A released version of this recipe" : "A saved version of this recipe");
  const [version, versionNumbers, settingsRecord, picks] = await Promise.all([
    getVersion({ workspaceId, recipeId, versionNo: wanted }),
    releasedOnly
      ? listVersions({ workspaceId, recipeId, releasedOnly: true }).then((vs) => vs.map((v) => v.versionNo).reverse())
      : listVersionNumbers({ workspaceId, recipeId }),
    getCostSettings({ workspaceId, recipeId }),
    listPicks({ workspaceId, recipeId }),
  ]);
  if (releasedOnly && !version.released) throw notFound(`Version v${wanted}`);
  const { baseCurrency, sources } = await listIngredientSources({ workspaceId, ingredientIds: version.lines.map((l) => l.ingredientId), on });
  const lines: CostLine[] = version.lines.map((l) => {
    const s = sources.get(l.ingredientId);
    const pick = picks.get(l.ingredientId);
    return {
      ingredientId: l.ingredientId,
      name: l.name,
      kind: s?.kind ?? "other",
      percent: l.percent,
      // The profile as saved with the version; its price comes from the chosen source instead.
      spec: toIngredientSpec({ ...l, pricePerKg: null }),
      preferredSupplierName: s?.preferredSupplierName ?? null,
      preferredKey: s?.preferredKey ?? null,
      pickKey: pick?.key ?? null,
      pickLabel: pick?.label ?? null,
      options: s?.options ?? [],
    };
  });
  const mismatch = settingsRecord.currency !== null && settingsRecord.currency !== baseCurrency;
  const settings = mismatch ? DEFAULT_COST_SETTINGS : settingsRecord.settings;
  return {
    recipe: { id: recipe.id, name: recipe.name, chocolateType: recipe.chocolateType, latestVersionNo: recipe.latestVersionNo },
    version: {
      versionNo: version.versionNo,
      note: version.note,
      barMassGrams: version.barMassGrams,
      createdAt: version.createdAt,
      released: version.released,
      composition: version.evaluation.composition,
    },
    versionNumbers,
    baseCurrency,
    on,
    settingsRecord,
    settings,
    currencyProblem: mismatch
      ? `These cost settings were entered in ${settingsRecord.currency}, but the base currency is now ${baseCurrency}. Ingredients only are costed until they are saved again in ${baseCurrency}.`
      : null,
    lines,
    report: buildCostingReport({ lines, settings, barMassGrams: version.barMassGrams, on }),
  };
}
