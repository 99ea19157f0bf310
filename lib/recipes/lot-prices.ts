/**
 * Pricing bench lines from bean lots instead of supplier quotes. A lot's nibs
 * price a nibs line directly, and a cocoa liquor (cocoa mass) line too: liquor
 * is the same nibs ground, so a kilogram of it costs a kilogram of nibs (what
 * refining loses is the cost model's process loss, not the ingredient price).
 * Pure; prices are decimal strings in the base currency.
 */
import type { RecipeLine } from "@/lib/formulation";

/** Ingredient kinds a lot's nibs can price. */
export const LOT_PRICED_KINDS: readonly string[] = ["nibs", "cocoa_liquor"];

/** A lot whose nibs can price a line: its nib cost per kg (base currency), estimated until winnowing is recorded. */
export type LotPriceSource = { lotId: string; code: string; originCountry: string; perKg: string; estimated: boolean };

/** The price choice of each line by ingredient id: a lot id; absent = the preferred supplier's quote. */
export type LotChoices = Readonly<Record<string, string>>;

/**
 * The lines with each chosen lot's nib cost as the price per kg. Lines whose
 * ingredient cannot be lot-priced, or whose lot is not among `sources` (gone,
 * or no nib cost), keep their price.
 */
export function withLotPrices(
  lines: readonly RecipeLine[],
  ingredients: ReadonlyArray<{ id: string; kind: string }>,
  choices: LotChoices,
  sources: readonly LotPriceSource[],
): RecipeLine[] {
  const byLot = new Map(sources.map((s) => [s.lotId, s]));
  return lines.map((line, i) => {
    const ingredient = ingredients[i];
    const lot = ingredient && LOT_PRICED_KINDS.includes(ingredient.kind) ? byLot.get(choices[ingredient.id] ?? "") : undefined;
    return lot ? { ...line, ingredient: { ...line.ingredient, pricePerKg: lot.perKg } } : line;
  });
}
