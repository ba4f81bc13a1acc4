import { apiLimits } from "@spanwright/contracts";
import { AppError } from "../http/appError.js";

/** The exchange-format result (`spanwright.result/1`) as stored and returned. */
export type SolveResultJson = Record<string, unknown>;

/** The solver as the API uses it: injected so the app factory does not pin the engine (or its threads). */
export interface Engine {
  /**
   * Resolves to the result as JSON text, or rejects with an error with `code` `invalid-model` |
   * `mechanism` | `too-large` (a SolverError, also for a solve past the deadline), or an AppError.
   */
  solve(model: unknown, options?: SolveOptions): Promise<string>;
}

export interface SolveOptions {
  /**
   * The same model as the JSON text it was parsed from, when the caller has it: a solver thread
   * then parses the text instead of receiving a structured clone of the parsed object (a string
   * crosses threads as one copy, an object graph is walked on both sides).
   */
  json?: string;
}

const solverCodes = new Set(["invalid-model", "mechanism", "too-large"]);

function isSolverFailure(error: unknown): error is { code: "invalid-model" | "mechanism" | "too-large"; message: string; where?: string } {
  if (!error || typeof error !== "object") return false;
  const e = error as { name?: unknown; code?: unknown };
  return e.name === "SolverError" && typeof e.code === "string" && solverCodes.has(e.code);
}

const listOf = (value: unknown): unknown[] => (Array.isArray(value) ? value : []);
const objectOf = (value: unknown): Record<string, unknown> => (value && typeof value === "object" ? (value as Record<string, unknown>) : {});

/**
 * An estimate of the solver's work, in units of roughly a microsecond or two of solver time (measured
 * on the shared 2-core machine, December 2026; the engine's cost, not a physical law):
 * - every load is a load vector solved and sampled along the whole beam: nodes × loads;
 * - a patterned case splits into one piece per span, and the envelope of the pieces is taken at every
 *   sample of every span: about nodes³ per patterned case, scaled by 1/20 to the same units;
 * - every requested station is evaluated for every case and combination.
 * Malformed shapes count as empty; the solver reports them.
 */
export function measureWork(model: unknown): number {
  const m = objectOf(model);
  const nodes = listOf(m.nodes).length;
  const cases = listOf(m.loadCases).map(objectOf);
  const loads = cases.reduce((sum, c) => sum + listOf(c.loads).length, 0);
  const patterned = cases.filter((c) => c.pattern === true).length;
  const results = cases.length + listOf(m.combinations).length;
  return Math.round(nodes * loads + (patterned * nodes ** 3) / 20 + listOf(m.stations).length * results);
}

/**
 * The API's size limits (the library itself has none), checked on the raw JSON before the solver
 * runs so an oversized model cannot tie up the server. Over a limit: 422 `too-large` naming it.
 */
export function checkModelSize(model: unknown): void {
  const m = objectOf(model);
  const cases = listOf(m.loadCases);
  const over: Array<[string, number, number]> = [
    ["nodes", listOf(m.nodes).length, apiLimits.nodes],
    ["loadCases", cases.length, apiLimits.loadCases],
    ["combinations", listOf(m.combinations).length, apiLimits.combinations],
    ["stations", listOf(m.stations).length, apiLimits.stations],
    ...cases.map((c, i): [string, number, number] => [`loadCases[${i}].loads`, listOf(objectOf(c).loads).length, apiLimits.loadsPerCase]),
  ];
  const first = over.find(([, count, limit]) => count > limit);
  if (first) {
    const [where, count, limit] = first;
    throw new AppError("too-large", `${where} has ${count} entries; the API accepts at most ${limit}`, { where, limit });
  }
  const work = measureWork(model);
  if (work > apiLimits.work) {
    throw new AppError(
      "too-large",
      `the model is too much work for the server (an estimate of ${work} from nodes, loads, patterned cases and stations; at most ${apiLimits.work}): solve it in parts`,
      { where: "", limit: apiLimits.work, work },
    );
  }
}

/** Runs the engine; the result as JSON text (the solve route sends it unparsed). */
export async function runSolverJson(engine: Engine, model: unknown, options?: SolveOptions): Promise<string> {
  checkModelSize(model);
  try {
    return await engine.solve(model, options);
  } catch (error) {
    if (isSolverFailure(error)) {
      throw new AppError(error.code, error.message, { where: error.where ?? "" });
    }
    throw error;
  }
}

/** Runs the engine; its expected failures become 422 AppErrors carrying `where`. */
export async function runSolver(engine: Engine, model: unknown): Promise<SolveResultJson> {
  return JSON.parse(await runSolverJson(engine, model)) as SolveResultJson;
}
