/**
 * What a planner types (an amount in g, kg or t, or a number of bars) as the
 * batch mass in kilograms that the engine's scaleBatch takes. Pure, exact
 * (decimal.js); SI prefixes: 1 kg = 1000 g, 1 t = 1000 kg.
 */
import Decimal from "decimal.js";
import type { BatchMassUnit } from "@/db/schema/batches";

const KG_PER_UNIT: Record<Exclude<BatchMassUnit, "bars">, string> = { g: "0.001", kg: "1", t: "1000" };

/** The batch mass in kg, a plain decimal string. Bars × the version's bar mass (no allowance for loss). */
export function batchMassKg(amount: string, unit: BatchMassUnit, barMassGrams: string): string {
  const value = new Decimal(amount);
  const kg = unit === "bars" ? value.times(barMassGrams).div(1000) : value.times(KG_PER_UNIT[unit]);
  return kg.toFixed();
}

export const MASS_UNIT_LABELS: Record<BatchMassUnit, string> = { g: "g", kg: "kg", t: "t", bars: "bars" };
