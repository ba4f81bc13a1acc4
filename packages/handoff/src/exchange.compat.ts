import type { BeamModel as SolverModel, SolveResult as SolverResult } from "@spanwright/solver";
import type { BeamModel, SolveResult } from "./exchange.js";

/**
 * Compile-time only: the solver's model and result types fit the shapes this package reads, so
 * `solve` output goes straight in. If the solver's types drift from the contract, typecheck fails.
 */
type Assert<T extends true> = T;
export type SolverModelFits = Assert<SolverModel extends BeamModel ? true : false>;
export type SolverResultFits = Assert<SolverResult extends SolveResult ? true : false>;
