/** The composition fields an ingredient may carry, grams per 100 g. */
export const COMPOSITION_FIELDS = [
  "cocoaButter",
  "cocoaSolidsNonFat",
  "milkFat",
  "milkSolidsNonFat",
  "sugar",
  "vegetableFat",
  "moisture",
] as const;
export type CompositionField = (typeof COMPOSITION_FIELDS)[number];

/**
 * Quantities the standards can test, each a percentage of a basis. Inclusion lines
 * contribute nothing to any of them.
 * - totalDryCocoaSolids = cocoaButter + cocoaSolidsNonFat (Directive 2000/36/EC Annex I)
 * - dryMilkSolids = milkFat + milkSolidsNonFat (21 CFR 163.130(a)(2))
 * - totalFat = cocoaButter + milkFat (Annex I; lecithin and vegetable fats excluded)
 * - usChocolateLiquor = 2.2 × (cocoa ingredients − their cocoa butter) (21 CFR 163.123(a)(2))
 * - other = whatever the ingredients' fields leave of their mass (lecithin, vanilla, salt…)
 */
export const STANDARD_QUANTITIES = [
  "totalDryCocoaSolids",
  "cocoaButter",
  "cocoaSolidsNonFat",
  "dryMilkSolids",
  "milkFat",
  "milkSolidsNonFat",
  "totalFat",
  "sugar",
  "vegetableFat",
  "moisture",
  "other",
  "usChocolateLiquor",
] as const;
export type StandardQuantity = (typeof STANDARD_QUANTITIES)[number];

/** Every quantity of the finished product's composition: the standards' ones plus inclusions. */
export type Quantity = StandardQuantity | "inclusions";

/** All quantities, in display order. */
export const QUANTITIES: readonly Quantity[] = [...STANDARD_QUANTITIES, "inclusions"];

/** Words for each quantity, in the regulations' vocabulary, for labels and messages. */
export const QUANTITY_LABELS: Readonly<Record<Quantity, string>> = {
  totalDryCocoaSolids: "total dry cocoa solids",
  cocoaButter: "cocoa butter",
  cocoaSolidsNonFat: "dry non-fat cocoa solids",
  dryMilkSolids: "dry milk solids",
  milkFat: "milk fat",
  milkSolidsNonFat: "non-fat milk solids",
  totalFat: "total fat",
  sugar: "sugar",
  vegetableFat: "vegetable fats other than cocoa butter",
  moisture: "moisture",
  other: "other ingredients",
  usChocolateLiquor: "chocolate liquor",
  inclusions: "inclusions",
};

/** True when `value` names a composition quantity. */
export function isQuantity(value: unknown): value is Quantity {
  return typeof value === "string" && (QUANTITIES as readonly string[]).includes(value);
}
