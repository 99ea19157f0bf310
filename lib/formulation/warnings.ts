/** Machine-readable kinds of warning the engine can give. */
export type WarningCode =
  | "invalid-recipe"
  | "empty-recipe"
  | "invalid-line"
  | "sum-not-100"
  | "invalid-percent"
  | "negative-percent"
  | "invalid-composition"
  | "negative-composition"
  | "composition-over-100"
  | "inclusions-over-40"
  | "empty-base"
  | "missing-price"
  | "invalid-price"
  | "invalid-option";

/** A problem found in the input, with a sentence for people and the line it concerns. */
export interface FormulationWarning {
  code: WarningCode;
  message: string;
  /** Zero-based index of the recipe line concerned, when there is one. */
  lineIndex?: number;
}

/** Builds a warning; `lineIndex` is left out when not given. */
export function makeWarning(
  code: WarningCode,
  message: string,
  lineIndex?: number,
): FormulationWarning {
  return lineIndex === undefined ? { code, message } : { code, message, lineIndex };
}
