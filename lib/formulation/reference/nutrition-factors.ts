import type { SourceStatus } from "../types";

/**
 * Constants of the nutrition declaration, each with its clause and how sure we are of it
 * (see /work/shared/REFERENCE.md §4 for the status words).
 */

const EU_1169 = "Regulation (EU) No 1169/2011";
const CFR_101_9 = "21 CFR 101.9";

/** A figure with where it comes from. */
export interface SourcedFactor {
  readonly value: string;
  readonly clause: string;
  readonly status: SourceStatus;
}

/**
 * EU energy conversion factors per gram, Regulation (EU) No 1169/2011 Annex XIV (primary).
 * Carbohydrate here is *available* carbohydrate (USDA's by-difference figure less fibre).
 * Polyols, alcohol and organic acids have factors too; chocolate recipes here carry none.
 */
export const EU_ENERGY_FACTORS = {
  fat: { kj: "37", kcal: "9" },
  carbohydrate: { kj: "17", kcal: "4" },
  protein: { kj: "17", kcal: "4" },
  fibre: { kj: "8", kcal: "2" },
  clause: `${EU_1169} Annex XIV`,
  status: "primary",
} as const;

/**
 * US general factors, kcal per gram of protein, total carbohydrate (fibre included) and total
 * fat, applied to unrounded amounts: 21 CFR 101.9(c)(1)(i)(B) (primary for the factors; the
 * sub-letter (B) from memory).
 */
export const US_GENERAL_FACTORS = {
  protein: "4",
  carbohydrate: "4",
  fat: "9",
  clause: `${CFR_101_9}(c)(1)(i)(B)`,
  status: "primary",
} as const;

/** Salt = sodium × 2.5: Regulation (EU) No 1169/2011 Annex I point 11 (primary). */
export const SALT_PER_SODIUM: SourcedFactor = { value: "2.5", clause: `${EU_1169} Annex I point 11`, status: "primary" };

/**
 * Reference intakes of an average adult, Regulation (EU) No 1169/2011 Annex XIII Part B
 * (REFERENCE.md §4: memory). Energy in kJ and kcal, the rest in grams.
 */
export const EU_REFERENCE_INTAKES = {
  energyKj: "8400",
  energyKcal: "2000",
  fat: "70",
  saturates: "20",
  carbohydrate: "260",
  sugars: "90",
  protein: "50",
  salt: "6",
  clause: `${EU_1169} Annex XIII Part B`,
  status: "memory",
} as const;

/**
 * Daily values for adults and children 4 years and over (2016 rule), 21 CFR 101.9(c)(9) and
 * (c)(7)(iii) (REFERENCE.md §4: memory). Grams, sodium in mg.
 */
export const US_DAILY_VALUES = {
  fat: "78",
  saturates: "20",
  sodiumMg: "2300",
  carbohydrate: "275",
  fibre: "28",
  addedSugars: "50",
  protein: "50",
  clause: `${CFR_101_9}(c)(9)`,
  status: "memory",
} as const;

/**
 * Reference amount customarily consumed (RACC) for chocolate bars: "all other candies", 30 g,
 * 21 CFR 101.12(b) Table 2 (REFERENCE.md §4: secondary).
 */
export const US_RACC_CHOCOLATE_BAR: SourcedFactor = { value: "30", clause: "21 CFR 101.12(b) Table 2 (candies, all other)", status: "secondary" };
