import { apiLimits } from "@spanwright/contracts";
import { AppError } from "../http/appError.js";

/** The exchange-format result (`spanwright.result/1`) as stored and returned. */
export type SolveResultJson = Record<string, unknown>;

/** The solver as the API uses it: injected so the app factory does not pin the engine. */
export interface Engine {
  /** Returns the result, or throws an error with `code` `invalid-model` | `mechanism` | `too-large`. */
  solve(model: unknown): SolveResultJson;
}

const solverCodes = new Set(["invalid-model", "mechanism", "too-large"]);

function isSolverFailure(error: unknown): error is { code: "invalid-model" | "mechanism" | "too-large"; message: string; where?: string } {
  if (!error || typeof error !== "object") return false;
  const e = error as { name?: unknown; code?: unknown };
  return e.name === "SolverError" && typeof e.code === "string" && solverCodes.has(e.code);
}

const lengthOf = (value: unknown): number => (Array.isArray(value) ? value.length : 0);

/**
 * The API's size limits (the library itself has none), checked on the raw JSON before the solver
 * runs so an oversized model cannot tie up the server. Over a limit: 422 `too-large`.
 */
export function checkModelSize(model: unknown): void {
  const m = (model && typeof model === "object" ? model : {}) as Record<string, unknown>;
  const cases = Array.isArray(m.loadCases) ? m.loadCases : [];
  const over: Array<[string, number, number]> = [
    ["nodes", lengthOf(m.nodes), apiLimits.nodes],
    ["loadCases", cases.length, apiLimits.loadCases],
    ["combinations", lengthOf(m.combinations), apiLimits.combinations],
    ...cases.map((c, i): [string, number, number] => [
      `loadCases[${i}].loads`,
      lengthOf((c as { loads?: unknown } | null)?.loads),
      apiLimits.loadsPerCase,
    ]),
  ];
  const first = over.find(([, count, limit]) => count > limit);
  if (first) {
    const [where, count, limit] = first;
    throw new AppError("too-large", `${where} has ${count} entries; the API accepts at most ${limit}`, { where, limit });
  }
}

/** Runs the engine; its expected failures become 422 AppErrors carrying `where`. */
export function runSolver(engine: Engine, model: unknown): SolveResultJson {
  checkModelSize(model);
  try {
    return engine.solve(model);
  } catch (error) {
    if (isSolverFailure(error)) {
      throw new AppError(error.code, error.message, { where: error.where ?? "" });
    }
    throw error;
  }
}
