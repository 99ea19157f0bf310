import type { Decimal } from "decimal.js";
import { Dec, HUNDRED } from "../decimal";
import { DEFAULT_INGREDIENTS } from "./ingredients";

/**
 * Complete nutrient profiles for the nutrition declaration of each reference ingredient
 * (DEFAULT_INGREDIENTS), g per 100 g of the ingredient. DEFAULT_INGREDIENTS carries the USDA
 * proximates the composition is derived from; this adds what a label needs besides
 * (saturates, salt) and fills the ingredients that have no USDA entry by a stated derivation.
 * Salt = sodium × 2.5 (Regulation (EU) No 1169/2011 Annex I point 11). Derived figures are
 * rounded half up to 0.01 g, salt to 0.0001 g (the library keeps four decimals).
 */

/** The nutrients a label is computed from, g per 100 g; missing = not known. */
export interface LabelNutrients {
  fat?: string;
  saturates?: string;
  /** USDA carbohydrate by difference, fibre included (the US "total carbohydrate"). */
  carbohydrateByDifference?: string;
  sugars?: string;
  fibre?: string;
  protein?: string;
  salt?: string;
}

export interface LabelNutrientProfile {
  readonly key: string;
  readonly nutrients: LabelNutrients;
  readonly sources: readonly string[];
}

const MEMORY = "from memory — verify";
const COCOA_FAT_SATURATES = new Dec("0.597"); // FDC 171421 (Oil, cocoa butter): 59.7 g saturates per 100 g fat
const MILK_FAT_SATURATES = new Dec("16.742").div("26.71"); // FDC 173454: saturates 16.742 g (from memory) of fat 26.71 g

const r2 = (d: Decimal): string => d.toDecimalPlaces(2, Dec.ROUND_HALF_UP).toFixed();
const saltFromSodiumMg = (mg: Decimal): string => mg.times("2.5").div(1000).toDecimalPlaces(4, Dec.ROUND_HALF_UP).toFixed();

/** g per 100 g of the USDA entry the derivations scale from. */
interface Proximates { fat: string; water: string; protein: string; carbohydrate: string; fibre: string; sugars: string; sodiumMg: string }

// USDA FoodData Central, SR Legacy. Proximates as in REFERENCE.md §3; sodium (and FDC 169593) from memory.
const LIQUOR_167568: Proximates = { fat: "52.31", water: "1.34", protein: "14.32", carbohydrate: "28.35", fibre: "16.6", sugars: "0.91", sodiumMg: "24" };
const COCOA_POWDER_169593: Proximates = { fat: "13.7", water: "3", protein: "19.6", carbohydrate: "57.9", fibre: "37", sugars: "1.75", sodiumMg: "21" };
const SKIM_MILK_POWDER_170877: Proximates = { fat: "0.77", water: "3.16", protein: "36.16", carbohydrate: "51.98", fibre: "0", sugars: "51.98", sodiumMg: "535" };

/**
 * An ingredient without its own USDA entry, from a related one: its non-fat dry part scaled by
 * (100 − fat − water) / (100 − source fat − source water); fat and saturates from its own fat.
 */
function scaleNonFat(source: Proximates, own: { fat: string; water: string }, saturatesPerFat: Decimal): LabelNutrients {
  const dry = (p: { fat: string; water: string }) => HUNDRED.minus(p.fat).minus(p.water);
  const k = dry(own).div(dry(source));
  return {
    fat: own.fat,
    saturates: r2(new Dec(own.fat).times(saturatesPerFat)),
    protein: r2(k.times(source.protein)),
    carbohydrateByDifference: r2(k.times(source.carbohydrate)),
    fibre: r2(k.times(source.fibre)),
    sugars: r2(k.times(source.sugars)),
    salt: saltFromSodiumMg(k.times(source.sodiumMg)),
  };
}

const PROFILES: Record<string, { nutrients: LabelNutrients; sources: string[] }> = {
  "cocoa-nibs": {
    nutrients: scaleNonFat(LIQUOR_167568, { fat: "55", water: "2" }, COCOA_FAT_SATURATES),
    sources: [
      "derived: non-fat dry part of USDA FDC 167568 (Baking chocolate, unsweetened) scaled to 55 % fat, 2 % moisture (common practice, no single source)",
      "saturates: 59.7 % of cocoa fat, USDA FDC 171421 (Oil, cocoa butter)",
      `sodium 24 mg per 100 g of FDC 167568: ${MEMORY}`,
    ],
  },
  "cocoa-liquor": {
    nutrients: { fat: "52.31", saturates: "32.35", carbohydrateByDifference: "28.35", sugars: "0.91", fibre: "16.6", protein: "14.32", salt: saltFromSodiumMg(new Dec(LIQUOR_167568.sodiumMg)) },
    sources: ["USDA FoodData Central FDC 167568 (Baking chocolate, unsweetened, squares)", `saturates 32.351 g and sodium 24 mg: ${MEMORY}`],
  },
  "cocoa-butter": {
    nutrients: { fat: "100", saturates: "59.7", carbohydrateByDifference: "0", sugars: "0", fibre: "0", protein: "0", salt: "0" },
    sources: ["USDA FoodData Central FDC 171421 (Oil, cocoa butter)", `sodium 0 mg: ${MEMORY}`],
  },
  "cocoa-powder-10-12": {
    nutrients: scaleNonFat(COCOA_POWDER_169593, { fat: "11", water: "3" }, COCOA_FAT_SATURATES),
    sources: [`derived: non-fat dry part of USDA FDC 169593 (Cocoa, dry powder, unsweetened; figures ${MEMORY}) scaled to 11 % fat, 3 % moisture`, "saturates: 59.7 % of cocoa fat, USDA FDC 171421"],
  },
  sucrose: {
    nutrients: { fat: "0", saturates: "0", carbohydrateByDifference: "99.98", sugars: "99.91", fibre: "0", protein: "0", salt: saltFromSodiumMg(new Dec(1)) },
    sources: ["USDA FoodData Central FDC 169655 (Sugars, granulated)", `sodium 1 mg: ${MEMORY}`],
  },
  "whole-milk-powder": {
    nutrients: { fat: "26.71", saturates: "16.74", carbohydrateByDifference: "38.42", sugars: "38.42", fibre: "0", protein: "26.32", salt: saltFromSodiumMg(new Dec(371)) },
    sources: ["USDA FoodData Central FDC 173454 (Milk, dry, whole)", `saturates 16.742 g and sodium 371 mg: ${MEMORY}`],
  },
  "skim-milk-powder": {
    nutrients: { fat: "0.77", saturates: "0.5", carbohydrateByDifference: "51.98", sugars: "51.98", fibre: "0", protein: "36.16", salt: saltFromSodiumMg(new Dec(SKIM_MILK_POWDER_170877.sodiumMg)) },
    sources: [`USDA FoodData Central FDC 170877 (Milk, dry, nonfat): protein seen quoted; saturates 0.499 g, sodium 535 mg and the rest ${MEMORY}`],
  },
  "buttermilk-powder": {
    nutrients: scaleNonFat(SKIM_MILK_POWDER_170877, { fat: "5.8", water: "3" }, MILK_FAT_SATURATES),
    sources: [`derived: non-fat dry part of USDA FDC 170877 (Milk, dry, nonfat) scaled to 5.8 % fat, 3 % moisture (${MEMORY})`, "saturates: the share of milk fat in FDC 173454"],
  },
  "soy-lecithin": {
    nutrients: { fat: "100", saturates: "15.01", carbohydrateByDifference: "0", sugars: "0", fibre: "0", protein: "0", salt: "0" },
    sources: ["USDA SR Legacy 04531 (Lecithin, soybean)", `saturates 15.005 g and sodium 0 mg: ${MEMORY}`],
  },
  vanilla: {
    nutrients: {},
    sources: ["no figures: ground vanilla pods have no USDA entry; used at well under 1 %, enter a supplier's figures"],
  },
};

/**
 * The label nutrient profile of every reference ingredient, in DEFAULT_INGREDIENTS order.
 * Vanilla has none (an empty profile: the declaration reports it as missing).
 */
export const LABEL_NUTRIENT_PROFILES: readonly LabelNutrientProfile[] = DEFAULT_INGREDIENTS.map((profile) => ({
  key: profile.key,
  nutrients: PROFILES[profile.key]?.nutrients ?? {},
  sources: PROFILES[profile.key]?.sources ?? [],
}));

/** The label nutrient profile of a reference ingredient key, or undefined. */
export function findLabelNutrients(key: string): LabelNutrientProfile | undefined {
  return LABEL_NUTRIENT_PROFILES.find((p) => p.key === key);
}
