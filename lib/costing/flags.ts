/**
 * Buying flags of a price option: a minimum order above what one batch needs,
 * a lead time longer than the buyer can wait, a quote about to expire, a lot
 * whose nib mass is still an estimate. The batch need comes from the engine's
 * scaleBatch (each line's grams in a batch of `batchKg`). Pure.
 */
import Decimal from "decimal.js";
import { scaleBatch } from "@/lib/formulation";
import type { CostLine, CostSettings, PriceOption } from "./types";

export type Flag = { code: "minimum-order" | "lead-time" | "expires" | "estimated"; severity: "warn" | "info"; message: string };

/** Days a quote may have left before we say it expires soon (our choice: a month of notice to re-quote). */
export const EXPIRY_NOTICE_DAYS = 30;

/** Kilograms of each ingredient one batch of `batchKg` needs (lines of one ingredient added up); null without a batch size. */
export function batchNeedKg(lines: readonly CostLine[], batchKg: string | null): Map<string, string> | null {
  if (!batchKg) return null;
  const scaled = scaleBatch(lines, { totalMassKg: batchKg, resolutionGrams: 1 });
  if (!scaled.ok) return null;
  const need = new Map<string, Decimal>();
  for (const l of scaled.lines) need.set(l.ingredientId, (need.get(l.ingredientId) ?? new Decimal(0)).plus(new Decimal(l.massGrams).div(1000)));
  return new Map([...need].map(([id, kg]) => [id, kg.toFixed()]));
}

function daysBetween(from: string, to: string): number {
  return Math.round((Date.parse(`${to}T00:00:00Z`) - Date.parse(`${from}T00:00:00Z`)) / 86_400_000);
}

/** The flags of one option for one ingredient, on day `on`. */
export function optionFlags(option: PriceOption, ctx: { settings: CostSettings; needKg: string | null; on: string }): Flag[] {
  const flags: Flag[] = [];
  if (option.minimumOrderKg) {
    const above = ctx.needKg !== null && new Decimal(option.minimumOrderKg).gt(ctx.needKg);
    flags.push({
      code: "minimum-order",
      severity: above ? "warn" : "info",
      message: above
        ? `Minimum order ${option.minimumOrderKg} kg, more than the ${new Decimal(ctx.needKg!).toDecimalPlaces(3).toFixed()} kg one batch needs.`
        : `Minimum order ${option.minimumOrderKg} kg.`,
    });
  }
  if (option.leadTimeDays !== null) {
    const late = ctx.settings.needWithinDays !== null && option.leadTimeDays > ctx.settings.needWithinDays;
    flags.push({
      code: "lead-time",
      severity: late ? "warn" : "info",
      message: late
        ? `Lead time ${option.leadTimeDays} days, longer than the ${ctx.settings.needWithinDays} days you can wait.`
        : `Lead time ${option.leadTimeDays} days.`,
    });
  }
  if (option.validUntil && daysBetween(ctx.on, option.validUntil) <= EXPIRY_NOTICE_DAYS) {
    flags.push({ code: "expires", severity: "warn", message: `Quote valid until ${option.validUntil}.` });
  }
  if (option.estimated) flags.push({ code: "estimated", severity: "info", message: "Nib mass estimated: winnowing not recorded yet." });
  return flags;
}
