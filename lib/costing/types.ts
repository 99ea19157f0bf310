/**
 * Shapes of the buyer's costing, shared by the server (which computes and
 * stores) and the browser (which recomputes live for "what if"). Money is in
 * the workspace's base currency, as unrounded decimal strings.
 */
import type { IngredientSpec } from "@/lib/formulation";
import type { PriceUnit } from "@/lib/pricing/convert";

/** The cost model of a recipe beyond its ingredients (see db/schema/costing.ts). */
export type CostSettings = {
  processLossPercent: string;
  packagingPerBar: string;
  labourPerBar: string;
  labourPerKg: string;
  overheadPerBar: string;
  overheadPerKg: string;
  barsPerCase: number;
  wholesaleMarginPercent: string | null;
  retailMarginPercent: string | null;
  wholesalePricePerBar: string | null;
  retailPricePerBar: string | null;
  /** Ingredients going into one batch, kg (compared with minimum orders). */
  batchKg: string | null;
  /** Days within which ingredients must arrive (compared with lead times). */
  needWithinDays: number | null;
};

/** Where an ingredient can be bought: a supplier's current quote, or a bean lot's nibs. */
export type PriceOption = {
  /** "supplier:<id>" or "lot:<id>". */
  key: string;
  kind: "supplier" | "lot";
  sourceId: string;
  label: string;
  /** Price per kg in the base currency; null when it cannot be worked out (see `problem`). */
  perKg: string | null;
  problem: string | null;
  /** The quote as written (suppliers only). */
  quoted: { price: string; currency: string; unit: PriceUnit; packKg: string | null } | null;
  validUntil: string | null;
  minimumOrderKg: string | null;
  leadTimeDays: number | null;
  /** A lot whose nib mass is still estimated (winnowing not recorded). */
  estimated: boolean;
};

/** One line of the version being costed, with every source of its ingredient. */
export type CostLine = {
  ingredientId: string;
  name: string;
  kind: string;
  percent: string;
  /** The ingredient as saved in the version, without a price (the price comes from a source). */
  spec: IngredientSpec;
  preferredSupplierName: string | null;
  /** Key of the preferred supplier's option; null when there is no preferred supplier. */
  preferredKey: string | null;
  /** Key of the buyer's pick for this recipe; null when none. */
  pickKey: string | null;
  /** Name of the picked supplier or lot (kept even when it no longer has a price). */
  pickLabel: string | null;
  options: PriceOption[];
};

export type ScenarioName = "preferred" | "cheapest" | "chosen";

/** The source used for one ingredient in a scenario, or why there is none. */
export type Choice = { ingredientId: string; key: string | null; perKg: string | null; note: string | null };
