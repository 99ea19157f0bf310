import { resolveCodexSettings, type CodexOptions, type ResolvedCodexSettings } from "./codex-settings";
import { describeInput } from "./decimal";
import { AUTHORITIES, type Authority } from "./types";
import { makeWarning, type FormulationWarning } from "./warnings";

/** Options of evaluateRecipe. */
export interface EvaluateOptions {
  /** Which authorities to check; all three when omitted. An empty list checks none. */
  authorities?: Authority[];
  /** Codex minimums left to national authorities; defaults 14 % milk solids, 3.5 % milk fat. */
  codex?: CodexOptions;
}

/** EvaluateOptions after validation. */
export interface ResolvedEvaluateOptions {
  authorities: ReadonlySet<Authority>;
  codex: ResolvedCodexSettings;
}

const ALL = new Set<Authority>(AUTHORITIES);

/** Validates evaluateRecipe's options; unknown authorities are ignored with a warning. */
export function resolveEvaluateOptions(options: unknown, warnings: FormulationWarning[]): ResolvedEvaluateOptions {
  if (options === undefined || options === null) return { authorities: ALL, codex: resolveCodexSettings(undefined, warnings) };
  if (typeof options !== "object") {
    warnings.push(makeWarning("invalid-option", "The options are not an object; all authorities and default settings are used."));
    return { authorities: ALL, codex: resolveCodexSettings(undefined, warnings) };
  }
  const given = options as Record<string, unknown>;
  let authorities: ReadonlySet<Authority> = ALL;
  if (given.authorities !== undefined) {
    if (!Array.isArray(given.authorities)) {
      warnings.push(makeWarning("invalid-option", "authorities is not a list; all authorities are checked."));
    } else {
      const chosen = new Set<Authority>();
      for (const item of given.authorities) {
        if (ALL.has(item as Authority)) chosen.add(item as Authority);
        else warnings.push(makeWarning("invalid-option", `Unknown authority ${describeInput(item)}; expected EU, US or Codex.`));
      }
      authorities = chosen;
    }
  }
  return { authorities, codex: resolveCodexSettings(given.codex, warnings) };
}
