/**
 * Which source prices each ingredient in the three scenarios the buyer
 * compares: the preferred suppliers, the cheapest source of each ingredient,
 * and the buyer's chosen combination (a pick per ingredient, the preferred
 * supplier where there is none). Pure; the day only shapes the messages.
 */
import { cheapestOption } from "./options";
import type { Choice, CostLine, ScenarioName } from "./types";

function preferredChoice(line: CostLine, on: string): Choice {
  const base = { ingredientId: line.ingredientId };
  if (!line.preferredKey) return { ...base, key: null, perKg: null, note: `${line.name} has no preferred supplier.` };
  const option = line.options.find((o) => o.key === line.preferredKey);
  if (!option) {
    return { ...base, key: null, perKg: null, note: `No quote from ${line.preferredSupplierName ?? "the preferred supplier"} for ${line.name} is valid on ${on}.` };
  }
  if (option.perKg === null) return { ...base, key: option.key, perKg: null, note: option.problem };
  return { ...base, key: option.key, perKg: option.perKg, note: null };
}

function cheapestChoice(line: CostLine): Choice {
  const option = cheapestOption(line.options);
  if (!option) return { ingredientId: line.ingredientId, key: null, perKg: null, note: `No source of ${line.name} has a valid price.` };
  return { ingredientId: line.ingredientId, key: option.key, perKg: option.perKg, note: null };
}

function chosenChoice(line: CostLine, on: string): Choice {
  if (!line.pickKey) return preferredChoice(line, on);
  const option = line.options.find((o) => o.key === line.pickKey);
  if (option?.perKg) return { ingredientId: line.ingredientId, key: option.key, perKg: option.perKg, note: null };
  const fallback = preferredChoice(line, on);
  const why = `Your pick for ${line.name} (${line.pickLabel ?? "a source"}) has no valid price on ${on}`;
  return { ...fallback, note: fallback.perKg ? `${why}; the preferred supplier is used.` : `${why}. ${fallback.note ?? ""}`.trim() };
}

/** One choice per line, in line order, for a scenario on day `on`. */
export function choicesFor(lines: readonly CostLine[], scenario: ScenarioName, on: string): Choice[] {
  return lines.map((line) => (scenario === "preferred" ? preferredChoice(line, on) : scenario === "cheapest" ? cheapestChoice(line) : chosenChoice(line, on)));
}
