import type { StandardCheck, StandardResult } from "@/lib/formulation";
import { pct } from "./format";

/** "short by 2.3 %", "over by 0.4 %", with two decimals when one would show 0.0. */
export function gap(check: StandardCheck): string {
  if (check.overBy === "0") return "at the maximum, which it must stay below";
  const amount = check.shortBy ?? check.overBy ?? "0";
  const decimals = Number(amount) > 0 && Number(amount) < 0.05 ? 2 : 1;
  return `${check.shortBy !== undefined ? "short by" : "over by"} ${pct(amount, decimals)}`;
}

/**
 * The words on a category's line: "meets", or the first failing limit's gap
 * ("short by 2.3 %"), with how many more limits fail after it.
 */
export function verdict(result: StandardResult): string {
  if (result.pass) return "meets";
  const failing = result.checks.filter((c) => !c.pass);
  if (failing.length === 0) return "meets";
  const first = gap(failing[0]!);
  return failing.length > 1 ? `${first} · ${failing.length - 1} more` : first;
}
