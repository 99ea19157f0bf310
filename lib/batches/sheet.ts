/**
 * The batch sheet's content from a saved plan (pure; the page and the PDF
 * render it): per load, the lines in weighing order with their masses as the
 * engine stored them, a warning where a mass is more than the scale takes,
 * and the allergens of the version's lines.
 */
import Decimal from "decimal.js";
import type { IngredientKind } from "@/db/schema/ingredients";
import { ALLERGENS, allergenLabel } from "@/lib/ingredients/allergens";
import { inWeighingOrder } from "./weighing-order";

type SheetSource = {
  resolutionGrams: string;
  stationCapacityKg: string | null;
  loads: { massGrams: string; lineMassesGrams: string[] }[];
  lines: { id: string; position: number; ingredientName: string; ingredientKind: IngredientKind; percent: string; allergens: string[] }[];
};

export type SheetLine = { lineId: string; position: number; ingredientName: string; percent: string; massGrams: string; overScale: boolean };
export type SheetLoad = { loadNo: number; massGrams: string; lines: SheetLine[] };

export function sheetLoads(batch: SheetSource): SheetLoad[] {
  const capacityGrams = batch.stationCapacityKg ? new Decimal(batch.stationCapacityKg).times(1000) : null;
  const ordered = inWeighingOrder(batch.lines.map((l, index) => ({ ...l, index })));
  return batch.loads.map((load, i) => ({
    loadNo: i + 1,
    massGrams: load.massGrams,
    lines: ordered.map((l) => {
      const massGrams = load.lineMassesGrams[l.index] ?? "0";
      return {
        lineId: l.id,
        position: l.position,
        ingredientName: l.ingredientName,
        percent: l.percent,
        massGrams,
        overScale: capacityGrams !== null && capacityGrams.lt(massGrams),
      };
    }),
  }));
}

const annexOrder = (code: string) => {
  const i = ALLERGENS.findIndex((a) => a.code === code);
  return i === -1 ? ALLERGENS.length : i;
};

/** Allergen labels present in any line, in the order of EU 1169/2011 Annex II (unknown codes last). */
export function sheetAllergens(lines: ReadonlyArray<{ allergens: readonly string[] }>): string[] {
  const codes = [...new Set(lines.flatMap((l) => l.allergens))].sort((a, b) => annexOrder(a) - annexOrder(b) || a.localeCompare(b));
  return codes.map(allergenLabel);
}
