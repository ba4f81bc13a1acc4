import { solve } from "@spanwright/solver";
import type { Engine, SolveResultJson } from "./engine.js";

/** The real engine from the solver package. */
export const solverEngine: Engine = {
  solve: (model) => solve(model) as unknown as SolveResultJson,
};
