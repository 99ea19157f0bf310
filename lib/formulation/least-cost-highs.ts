import type { Highs, InitOptions } from "highs";

/**
 * The linear-programming solver the least-cost mix uses: HiGHS (University of Edinburgh)
 * compiled to WebAssembly, from the `highs` package. It is loaded once per process or page (the
 * first load compiles the WebAssembly, ~100 ms; later solves take about a millisecond).
 */
export type LpSolver = Highs;

/** Where to find `highs.wasm`: Node finds it beside the package; a browser page passes `locateFile`. */
export type LpSolverLoadOptions = Pick<InitOptions, "locateFile">;

let loading: Promise<LpSolver> | undefined;

/**
 * Loads HiGHS once and returns the same instance on every later call. A failed load is not
 * cached, so a later call tries again. The package is imported lazily so that importing the
 * engine never pulls the solver into a page that does not use it.
 */
export function loadLpSolver(options?: LpSolverLoadOptions): Promise<LpSolver> {
  loading ??= import("highs")
    .then((module) => {
      const load = (module.default ?? module) as unknown as (o?: LpSolverLoadOptions) => Promise<LpSolver>;
      return load(options);
    })
    .catch((error: unknown) => {
      loading = undefined;
      throw error;
    });
  return loading;
}

/** A dense linear (or mixed-integer) programme: minimise cost·x subject to rows and column bounds. */
export interface NumericLp {
  readonly cost: readonly number[];
  readonly colLower: readonly number[];
  readonly colUpper: readonly number[];
  /** integer[j] makes column j an integer variable. */
  readonly integer?: readonly boolean[];
  readonly rows: readonly { readonly coefficients: readonly number[]; readonly lower: number; readonly upper: number }[];
  /** Wall-clock limit for integer searches, seconds. */
  readonly timeLimitSeconds?: number;
  /** Extra HiGHS options (names as in HiGHS). */
  readonly options?: Readonly<Record<string, boolean | number | string>>;
}

/** What the solver found: an optimum, a proof of infeasibility, or a limit (with a solution if any). */
export interface LpOutcome {
  readonly status: "optimal" | "infeasible" | "limit" | "failed";
  readonly x?: readonly number[];
  readonly objective?: number;
}

// HiGHS model status codes (types.d.ts ModelStatusCode): 7 optimal, 8 infeasible, 13 time limit…
const OPTIMAL = 7;
const INFEASIBLE = 8;
const LIMITS = new Set([11, 12, 13, 14, 16, 17]);

function toModel(solver: LpSolver, lp: NumericLp) {
  const numCols = lp.cost.length;
  const starts: number[] = [0];
  const indices: number[] = [];
  const values: number[] = [];
  const rowLower: number[] = [];
  const rowUpper: number[] = [];
  for (const row of lp.rows) {
    row.coefficients.forEach((value, j) => {
      if (value !== 0) {
        indices.push(j);
        values.push(value);
      }
    });
    starts.push(indices.length);
    rowLower.push(Number.isFinite(row.lower) ? row.lower : -solver.infinity);
    rowUpper.push(Number.isFinite(row.upper) ? row.upper : solver.infinity);
  }
  const integer = solver.constants.variableType.integer;
  const continuous = solver.constants.variableType.continuous;
  return {
    numCols,
    numRows: lp.rows.length,
    colCost: [...lp.cost],
    colLower: [...lp.colLower],
    colUpper: [...lp.colUpper],
    rowLower,
    rowUpper,
    matrix: { format: "csr" as const, numRows: lp.rows.length, numCols, starts, indices, values },
    ...(lp.integer?.some(Boolean) ? { integrality: lp.integer.map((isInt) => (isInt ? integer : continuous)) } : {}),
  };
}

/**
 * Solves one programme with HiGHS. Never throws: a solver error comes back as "failed". Integer
 * searches run to a zero gap (the grid optimum) unless the time limit stops them first.
 */
export function runLp(solver: LpSolver, lp: NumericLp): LpOutcome {
  let model: ReturnType<LpSolver["createModel"]> | undefined;
  try {
    model = solver.createModel(toModel(solver, lp));
    model.options.set({ output_flag: false, mip_rel_gap: 0, mip_abs_gap: 1e-9 });
    // A bench LP has a few dozen rows: presolve costs more than it saves (about 2 ms of 3).
    if (lp.integer?.some(Boolean) !== true) model.options.set("presolve", "off");
    if (lp.timeLimitSeconds !== undefined) model.options.set("time_limit", lp.timeLimitSeconds);
    if (lp.options !== undefined) model.options.set(lp.options);
    model.run();
    const status = model.getModelStatus();
    if (status === INFEASIBLE) return { status: "infeasible" };
    if (status !== OPTIMAL && !LIMITS.has(status)) return { status: "failed" };
    const primal = model.info.get("primal_solution_status");
    const feasible = Number(primal) === solver.constants.solutionStatus.feasible;
    const x = feasible ? Array.from(model.getSolution().colValue) : undefined;
    if (status === OPTIMAL) return x === undefined ? { status: "failed" } : { status: "optimal", x, objective: model.getObjectiveValue() };
    return x === undefined ? { status: "limit" } : { status: "limit", x, objective: model.getObjectiveValue() };
  } catch {
    return { status: "failed" };
  } finally {
    model?.dispose();
  }
}
