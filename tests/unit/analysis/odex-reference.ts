/**
 * Typed access to the odex package (a port of Hairer & Wanner's ODEX Gragg-Bulirsch-Stoer
 * extrapolation solver), used only as an independent adaptive reference in tests. Loaded through
 * require so that TypeScript does not type-check the package's own .ts source.
 */
import { createRequire } from "node:module";

type Derivative = (t: number, y: number[]) => number[];
interface OdexSolver {
  absoluteTolerance: number;
  relativeTolerance: number;
  maxSteps: number;
  solve(f: Derivative, t0: number, y0: number[], t1: number): { y: number[]; outcome: number };
}

const { Solver } = createRequire(import.meta.url)("odex") as { Solver: new (n: number) => OdexSolver };

/**
 * Integrates y' = f(t, y) from t0 to t1 with odex at the given tolerance (absolute and relative).
 * Throws when the solver reports failure.
 */
export function odexSolve(f: Derivative, t0: number, y0: number[], t1: number, tolerance = 1e-12): number[] {
  const solver = new Solver(y0.length);
  solver.absoluteTolerance = tolerance;
  solver.relativeTolerance = tolerance;
  solver.maxSteps = 1e6;
  const result = solver.solve(f, t0, y0, t1);
  if (result.outcome !== 0) throw new Error(`odex failed with outcome ${result.outcome}`);
  return result.y;
}
