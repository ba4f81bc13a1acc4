import type { BeamModel as SolverModel, SolveResult as SolverResult } from "@spanwright/solver";
import type { BeamModel, SolveResult } from "./exchange.js";

/**
 * Compile-time check (typecheck only, no runtime code): the solver's model and result types fit
 * the shapes this package reads, so callers pass `solve` output straight in.
 */
export type SolverModelFits = SolverModel extends BeamModel ? true : never;
export type SolverResultFits = SolverResult extends SolveResult ? true : never;
const modelFits: SolverModelFits = true;
const resultFits: SolverResultFits = true;
export const exchangeCompat = { modelFits, resultFits };
