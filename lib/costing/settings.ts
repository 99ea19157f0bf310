/** Cost settings: the defaults before a buyer enters any, and their engine form. Pure. */
import type { CostOptions } from "@/lib/formulation";
import type { CostSettings } from "./types";

/** Ingredients only: no loss, packaging, labour or overhead, one bar per case, no margins or prices. */
export const DEFAULT_COST_SETTINGS: CostSettings = {
  processLossPercent: "0",
  packagingPerBar: "0",
  labourPerBar: "0",
  labourPerKg: "0",
  overheadPerBar: "0",
  overheadPerKg: "0",
  barsPerCase: 1,
  wholesaleMarginPercent: null,
  retailMarginPercent: null,
  wholesalePricePerBar: null,
  retailPricePerBar: null,
  batchKg: null,
  needWithinDays: null,
};

/** The engine's costing options for a bar of `barMassGrams` under these settings. */
export function toCostOptions(settings: CostSettings, barMassGrams: string): CostOptions {
  return {
    barMassGrams,
    processLossPercent: settings.processLossPercent,
    packagingPerBar: settings.packagingPerBar,
    labourPerBar: settings.labourPerBar,
    labourPerKg: settings.labourPerKg,
    overheadPerBar: settings.overheadPerBar,
    overheadPerKg: settings.overheadPerKg,
    barsPerCase: settings.barsPerCase,
  };
}
