/** Browser entry of the optimizer benchmark (bundled by scripts/bench-optimizer.ts). */
import { loadLpSolver } from "../lib/formulation";
import { DARK_8, MILK_20 } from "./bench-optimizer-problems";
import { medianSolveMs } from "./bench-optimizer-timing";

void (async () => {
  const solver = await loadLpSolver({ locateFile: () => "/highs.wasm" });
  (window as unknown as { benchResult: unknown }).benchResult = {
    dark8: medianSolveMs(solver, DARK_8),
    milk20: medianSolveMs(solver, MILK_20),
  };
})();
