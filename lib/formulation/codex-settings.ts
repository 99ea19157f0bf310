import type { Decimal } from "decimal.js";
import { Dec, describeInput, readDecimal, toDecimalString } from "./decimal";
import { CODEX_SETTINGS, type CodexSettingName } from "./reference/standards";
import { makeWarning, type FormulationWarning } from "./warnings";

/** The Codex minimums left to national authorities, as chosen by the caller (percent). */
export type CodexOptions = Partial<Record<CodexSettingName, number | string>>;

/** The Codex settings after validation. */
export type ResolvedCodexSettings = Readonly<Record<CodexSettingName, Decimal>>;

const NAMES = Object.keys(CODEX_SETTINGS) as CodexSettingName[];

/** The defaults: top of each range, Codex CXS 87-1981 sections 2.1.4 and 2.1.8. */
export const DEFAULT_CODEX_SETTINGS: ResolvedCodexSettings = Object.fromEntries(
  NAMES.map((name) => [name, new Dec(CODEX_SETTINGS[name].default)]),
) as ResolvedCodexSettings;

/**
 * Validates the caller's Codex settings. A missing value takes the default; a non-number
 * takes the default with a warning; a value outside the Codex range is clamped into it,
 * with a warning (the range is the Codex text's own: 12–14 % milk solids, 2.5–3.5 % milk fat).
 */
export function resolveCodexSettings(options: unknown, warnings: FormulationWarning[]): ResolvedCodexSettings {
  if (options === undefined || options === null) return DEFAULT_CODEX_SETTINGS;
  if (typeof options !== "object") {
    warnings.push(makeWarning("invalid-option", "The Codex settings are not an object; the defaults are used."));
    return DEFAULT_CODEX_SETTINGS;
  }
  const given = options as Record<string, unknown>;
  const resolved = { ...DEFAULT_CODEX_SETTINGS } as Record<CodexSettingName, Decimal>;
  for (const name of NAMES) {
    const range = CODEX_SETTINGS[name];
    const read = readDecimal(given[name]);
    if (!read.ok) {
      if (read.problem !== "missing") {
        warnings.push(makeWarning("invalid-option", `Codex setting ${name} ${describeInput(given[name])} is not a number; the default ${range.default} % is used.`));
      }
      continue;
    }
    const low = new Dec(range.min);
    const high = new Dec(range.max);
    const value = Dec.min(high, Dec.max(low, read.value));
    if (!value.eq(read.value)) {
      warnings.push(makeWarning("invalid-option", `Codex setting ${name} ${toDecimalString(read.value)} % is outside ${range.min}–${range.max} % (${range.clause}); ${toDecimalString(value)} % is used.`));
    }
    resolved[name] = value;
  }
  return resolved;
}
