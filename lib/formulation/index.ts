/**
 * Barwright's formulation engine: pure, deterministic functions over recipes. No I/O, no clock,
 * no randomness; imports only decimal.js and its own files. Figures leave as decimal strings
 * (see toDecimalString and README.md in this folder); pass/fail is exact.
 */
export * from "./types";
export * from "./quantities";
export * from "./warnings";
export { toDecimalString, readDecimal, type ReadResult, type ReadProblem } from "./decimal";
export * from "./evaluate";
export type { EvaluateOptions } from "./evaluate-options";
export type { CodexOptions } from "./codex-settings";
export { DEFAULT_CODEX_SETTINGS } from "./codex-settings";
export type { CompositionFigures, BaseFigures } from "./figures";
export { summarizeStandards, type FailedCheck, type StandardCheck, type StandardResult, type StandardSummary } from "./standards";
export * from "./rebalance";
export * from "./normalize";
export { DEFAULT_PERCENT_RESOLUTION } from "./resolution";
export * from "./reference/standards";
export * from "./solve-for-target";
export type { SolveBasis, TargetDirection } from "./target-terms";
export * from "./scale-batch";
export * from "./cost";
export * from "./money";
export * from "./check-standards";
export * from "./reference/ingredients";
export { dairyComposition, cocoaComposition, type NutrientsPer100g } from "./reference/derive";
export * from "./yield-chain";
export * from "./reference/process-ranges";
export * from "./nutrition";
export * from "./label-rounding-eu";
export * from "./label-rounding-us";
export * from "./serving-size-us";
export * from "./us-nutrition-panel";
export * from "./ingredient-statement";
export * from "./label-statements";
export * from "./reference/nutrition-factors";
export * from "./reference/label-nutrients";
export * from "./reference/label-names";
export * from "./reference/allergens";
export * from "./least-cost-types";
export { solveLeastCost } from "./least-cost";
export { loadLpSolver, type LpSolver, type LpSolverLoadOptions } from "./least-cost-highs";
