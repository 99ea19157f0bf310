/**
 * The buyer's costing of one recipe version: the three scenarios (preferred,
 * cheapest, chosen), the supplier comparison table with the cheapest source
 * and buying flags of each ingredient, and the cost per bar with each source
 * swapped into the chosen combination (the bar chart). Pure and serialisable.
 */
import Decimal from "decimal.js";
import { choicesFor } from "./choices";
import { costCombination, withPrice, type Margins } from "./combination";
import { batchNeedKg, optionFlags, type Flag } from "./flags";
import { cheapestOption } from "./options";
import type { Choice, CostLine, CostSettings, PriceOption, ScenarioName } from "./types";
import type { CostResult } from "@/lib/formulation";

export type CostingInput = { lines: CostLine[]; settings: CostSettings; barMassGrams: string; on: string };

export type ScenarioReport = { name: ScenarioName; choices: Choice[]; cost: CostResult; margins: Margins | null };

export type ComparisonCell = { option: PriceOption; flags: Flag[] };

export type ComparisonRow = {
  ingredientId: string;
  name: string;
  kind: string;
  /** Share of the recipe, percent (lines of the same ingredient added up). */
  percent: string;
  needKg: string | null;
  preferredKey: string | null;
  cheapestKey: string | null;
  chosenKey: string | null;
  cells: Record<string, ComparisonCell>;
};

export type SwapBar = { ingredientId: string; name: string; bars: { key: string; label: string; costPerBar: string | null }[] };

export type CostingReport = {
  scenarios: Record<ScenarioName, ScenarioReport>;
  columns: { key: string; label: string; kind: "supplier" | "lot" }[];
  rows: ComparisonRow[];
  swaps: SwapBar[];
};

export const SCENARIO_LABELS: Record<ScenarioName, string> = {
  preferred: "Preferred suppliers",
  cheapest: "Cheapest per ingredient",
  chosen: "Chosen combination",
};

function scenario(input: CostingInput, name: ScenarioName): ScenarioReport {
  const choices = choicesFor(input.lines, name, input.on);
  return { name, choices, ...costCombination(input.lines, choices, input.settings, input.barMassGrams) };
}

/** Each ingredient once, in the order it first appears, with its share summed. */
function distinctIngredients(lines: readonly CostLine[]): { line: CostLine; percent: string }[] {
  const seen = new Map<string, { line: CostLine; percent: Decimal }>();
  for (const line of lines) {
    const entry = seen.get(line.ingredientId);
    if (entry) entry.percent = entry.percent.plus(line.percent);
    else seen.set(line.ingredientId, { line, percent: new Decimal(line.percent) });
  }
  return [...seen.values()].map((e) => ({ line: e.line, percent: e.percent.toFixed() }));
}

export function buildCostingReport(input: CostingInput): CostingReport {
  const scenarios = { preferred: scenario(input, "preferred"), cheapest: scenario(input, "cheapest"), chosen: scenario(input, "chosen") };
  const need = batchNeedKg(input.lines, input.settings.batchKg);
  const columns = new Map<string, CostingReport["columns"][number]>();
  const rows: ComparisonRow[] = [];
  const swaps: SwapBar[] = [];
  for (const { line, percent } of distinctIngredients(input.lines)) {
    const needKg = need?.get(line.ingredientId) ?? null;
    const cells: Record<string, ComparisonCell> = {};
    for (const option of line.options) {
      if (!columns.has(option.key)) columns.set(option.key, { key: option.key, label: option.label, kind: option.kind });
      cells[option.key] = { option, flags: optionFlags(option, { settings: input.settings, needKg, on: input.on }) };
    }
    const chosenKey = scenarios.chosen.choices.find((c) => c.ingredientId === line.ingredientId)?.key ?? null;
    rows.push({ ingredientId: line.ingredientId, name: line.name, kind: line.kind, percent, needKg, preferredKey: line.preferredKey, cheapestKey: cheapestOption(line.options)?.key ?? null, chosenKey, cells });
    const priced = line.options.filter((o) => o.perKg !== null);
    if (priced.length === 0) continue;
    swaps.push({
      ingredientId: line.ingredientId,
      name: line.name,
      bars: priced.map((o) => {
        const { cost } = costCombination(input.lines, withPrice(scenarios.chosen.choices, line.ingredientId, o.key, o.perKg), input.settings, input.barMassGrams);
        return { key: o.key, label: o.label, costPerBar: cost.ok ? cost.costPerBar : null };
      }),
    });
  }
  // Suppliers first, then lots, each by name: the same order on screen, in the CSV and in print.
  const ordered = [...columns.values()].sort((a, b) => (a.kind === b.kind ? a.label.localeCompare(b.label) : a.kind === "supplier" ? -1 : 1));
  return { scenarios, columns: ordered, rows, swaps };
}
