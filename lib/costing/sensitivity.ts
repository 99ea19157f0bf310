/**
 * Sensitivity and "what if": the cost per bar and margins when one
 * ingredient's price changes, the rest of the combination unchanged. The
 * costing itself is the engine's (via costCombination). Pure, so the page can
 * run it live in the browser.
 */
import Decimal from "decimal.js";
import { percentChange } from "@/lib/pricing/convert";
import { costCombination, withPrice, type CombinationCost } from "./combination";
import type { Choice, CostLine, CostSettings } from "./types";

/** Price changes charted, percent: −20 % to +50 % in steps of 5. */
export const SENSITIVITY_STEPS: readonly number[] = Array.from({ length: 15 }, (_, i) => -20 + 5 * i);

export type SensitivityPoint = {
  changePercent: number;
  perKg: string;
  costPerBar: string | null;
  wholesaleMargin: string | null;
  retailMargin: string | null;
};

/** `perKg` changed by `changePercent` %: perKg × (100 + change) ÷ 100, exact. */
export function changedPrice(perKg: string, changePercent: number | string): string {
  return new Decimal(perKg).times(new Decimal(100).plus(changePercent)).div(100).toFixed();
}

type Base = { lines: readonly CostLine[]; choices: readonly Choice[]; settings: CostSettings; barMassGrams: string };

function basePrice(base: Base, ingredientId: string): { key: string | null; perKg: string } | string {
  const choice = base.choices.find((c) => c.ingredientId === ingredientId);
  if (!choice) return "That ingredient is not in this version.";
  if (!choice.perKg) return "That ingredient has no price in this combination.";
  return { key: choice.key, perKg: choice.perKg };
}

function point(base: Base, ingredientId: string, key: string | null, changePercent: number, perKg: string): SensitivityPoint {
  const { cost, margins } = costCombination(base.lines, withPrice(base.choices, ingredientId, key, perKg), base.settings, base.barMassGrams);
  const value = (m: { ok: true; value: string } | { ok: false } | null | undefined) => (m && m.ok ? m.value : null);
  return {
    changePercent,
    perKg,
    costPerBar: cost.ok ? cost.costPerBar : null,
    wholesaleMargin: value(margins?.wholesaleMargin),
    retailMargin: value(margins?.retailMargin),
  };
}

/** One point per step for an ingredient priced in the combination, or a reason. */
export function sensitivity(
  base: Base,
  ingredientId: string,
  steps: readonly number[] = SENSITIVITY_STEPS,
): { ok: true; basePerKg: string; points: SensitivityPoint[] } | { ok: false; reason: string } {
  const from = basePrice(base, ingredientId);
  if (typeof from === "string") return { ok: false, reason: from };
  return { ok: true, basePerKg: from.perKg, points: steps.map((s) => point(base, ingredientId, from.key, s, changedPrice(from.perKg, s))) };
}

/** The combination before and after giving one ingredient a new price per kg (nothing is saved). */
export function whatIf(
  base: Base,
  ingredientId: string,
  newPerKg: string,
): { ok: true; before: CombinationCost; after: CombinationCost; changePercent: string | null } | { ok: false; reason: string } {
  const from = basePrice(base, ingredientId);
  if (typeof from === "string") return { ok: false, reason: from };
  return {
    ok: true,
    before: costCombination(base.lines, base.choices, base.settings, base.barMassGrams),
    after: costCombination(base.lines, withPrice(base.choices, ingredientId, from.key, newPerKg), base.settings, base.barMassGrams),
    changePercent: percentChange(from.perKg, newPerKg),
  };
}
