import { solve } from "@spanwright/solver";
import type { Engine } from "./engine.js";

/**
 * The engine on the calling thread: for tests and scripts that solve a few small models. The server
 * uses the thread pool (solverPool.ts) so a long solve cannot block other requests.
 */
export const solverEngine: Engine = {
  solve: async (model) => JSON.stringify(solve(model)),
};
