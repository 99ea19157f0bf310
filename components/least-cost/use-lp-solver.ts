"use client";

import { useEffect, useState } from "react";
import { loadLpSolver, type LpSolver } from "@/lib/formulation";

/** Where the browser fetches the solver's WebAssembly (app/api/least-cost/highs.wasm). */
export const SOLVER_WASM_URL = "/api/least-cost/highs.wasm";

export type SolverState = { status: "loading" } | { status: "ready"; solver: LpSolver } | { status: "failed"; message: string };

/** Loads HiGHS once per page (the engine caches it) and says when it is ready. */
export function useLpSolver(): SolverState {
  const [state, setState] = useState<SolverState>({ status: "loading" });
  useEffect(() => {
    let live = true;
    loadLpSolver({ locateFile: (file) => (file.endsWith(".wasm") ? SOLVER_WASM_URL : file) })
      .then((solver) => live && setState({ status: "ready", solver }))
      .catch(() => live && setState({ status: "failed", message: "The solver could not load in this browser; reload the page to try again." }));
    return () => {
      live = false;
    };
  }, []);
  return state;
}
