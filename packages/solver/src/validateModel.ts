import type { z } from "zod";
import { beamModelSchema, type BeamModel, type Load } from "./beamModelSchema.js";
import { fail, ok, type Result } from "./errors.js";

/** Formats a zod issue path as the contract's `where`, e.g. `segments[2].I`. */
export function formatPath(path: readonly PropertyKey[]): string {
  let out = "";
  for (const key of path) {
    if (typeof key === "number") out += `[${key}]`;
    else out += out === "" ? String(key) : `.${String(key)}`;
  }
  return out === "" ? "(model)" : out;
}

function describeIssue(issue: z.core.$ZodIssue): string {
  const where = formatPath(issue.path);
  if (issue.code === "unrecognized_keys") return `${where} has unknown field(s): ${issue.keys.join(", ")}`;
  return `${where}: ${issue.message}`;
}

/**
 * Checks a model against the exchange format: the zod schema first, then the rules a schema
 * cannot express (ordering, counts, hinge rules, load positions, ids). Pure; never throws.
 */
export function validateModel(input: unknown): Result<BeamModel> {
  const parsed = beamModelSchema.safeParse(input);
  if (!parsed.success) {
    const issue = parsed.error.issues[0]!;
    return fail("invalid-model", describeIssue(issue), formatPath(issue.path));
  }
  const problem = findSemanticProblem(parsed.data);
  return problem ? fail("invalid-model", problem.message, problem.where) : ok(parsed.data);
}

interface Problem {
  message: string;
  where: string;
}

function findSemanticProblem(model: BeamModel): Problem | undefined {
  return checkNodes(model) ?? checkSegments(model) ?? checkLoadCases(model) ?? checkCombinations(model) ?? checkStations(model);
}

function checkNodes(model: BeamModel): Problem | undefined {
  const { nodes } = model;
  for (let i = 1; i < nodes.length; i++) {
    if (!(nodes[i]!.x > nodes[i - 1]!.x)) {
      return { where: `nodes[${i}].x`, message: `node x positions must strictly increase: nodes[${i}].x = ${nodes[i]!.x} m is not greater than ${nodes[i - 1]!.x} m` };
    }
  }
  for (let i = 0; i < nodes.length; i++) {
    const node = nodes[i]!;
    const support = node.support;
    if (support?.type === "spring" && !((support.ky ?? 0) > 0 || (support.kr ?? 0) > 0)) {
      return { where: `nodes[${i}].support`, message: `the spring at nodes[${i}] needs ky or kr greater than 0` };
    }
    if (!node.hinge) continue;
    if (i === 0 || i === nodes.length - 1) {
      return { where: `nodes[${i}].hinge`, message: `a hinge cannot sit at an end of the beam (nodes[${i}])` };
    }
    const restrainsRotation =
      support?.type === "fixed" || support?.type === "guided" || (support?.type === "spring" && (support.kr ?? 0) > 0);
    if (restrainsRotation) {
      return { where: `nodes[${i}].hinge`, message: `a hinge cannot sit on a node whose support restrains rotation (nodes[${i}], ${support!.type})` };
    }
  }
  return undefined;
}

function checkSegments(model: BeamModel): Problem | undefined {
  const expected = model.nodes.length - 1;
  if (model.segments.length !== expected) {
    return { where: "segments", message: `expected ${expected} segments for ${model.nodes.length} nodes, found ${model.segments.length}` };
  }
  if (model.theory !== "timoshenko") return undefined;
  for (let i = 0; i < model.segments.length; i++) {
    const segment = model.segments[i]!;
    for (const key of ["A", "G", "shearFactor"] as const) {
      if (segment[key] === undefined) {
        return { where: `segments[${i}].${key}`, message: `Timoshenko theory needs ${key} on every segment; segments[${i}] has none` };
      }
    }
  }
  return undefined;
}

function checkLoadCases(model: BeamModel): Problem | undefined {
  const ids = new Set<string>();
  for (let c = 0; c < model.loadCases.length; c++) {
    const loadCase = model.loadCases[c]!;
    if (loadCase.id === "*") return { where: `loadCases[${c}].id`, message: `load case id "*" is reserved for the envelope over all combinations` };
    if (ids.has(loadCase.id)) return { where: `loadCases[${c}].id`, message: `load case id "${loadCase.id}" is used twice` };
    ids.add(loadCase.id);
    for (let l = 0; l < loadCase.loads.length; l++) {
      const problem = checkLoad(model, loadCase.loads[l]!, `loadCases[${c}].loads[${l}]`);
      if (problem) return problem;
    }
  }
  return undefined;
}

function checkLoad(model: BeamModel, load: Load, path: string): Problem | undefined {
  const x0 = model.nodes[0]!.x;
  const xEnd = model.nodes[model.nodes.length - 1]!.x;
  const outside = (x: number) => x < x0 || x > xEnd;
  const range = `the beam runs from x = ${x0} m to ${xEnd} m`;
  switch (load.type) {
    case "point":
    case "moment":
      return outside(load.x) ? { where: `${path}.x`, message: `${path}.x = ${load.x} m lies outside the beam: ${range}` } : undefined;
    case "distributed":
      if (outside(load.x1)) return { where: `${path}.x1`, message: `${path}.x1 = ${load.x1} m lies outside the beam: ${range}` };
      if (outside(load.x2)) return { where: `${path}.x2`, message: `${path}.x2 = ${load.x2} m lies outside the beam: ${range}` };
      if (!(load.x1 < load.x2)) return { where: `${path}.x2`, message: `${path} needs x1 < x2 (got ${load.x1} m and ${load.x2} m)` };
      return undefined;
    case "settlement": {
      const node = model.nodes[load.node];
      if (!node) return { where: `${path}.node`, message: `${path}.node = ${load.node} does not exist (the model has ${model.nodes.length} nodes)` };
      const type = node.support?.type;
      if (type !== "pinned" && type !== "fixed") {
        return { where: `${path}.node`, message: `a settlement needs a node whose support restrains uy (pinned or fixed); node ${load.node} has ${type ?? "no support"}` };
      }
      return undefined;
    }
    default: {
      const never: never = load;
      return never;
    }
  }
}

function checkCombinations(model: BeamModel): Problem | undefined {
  const caseIds = new Set(model.loadCases.map((c) => c.id));
  const seen = new Set<string>();
  for (let j = 0; j < model.combinations.length; j++) {
    const combination = model.combinations[j]!;
    if (caseIds.has(combination.id) || seen.has(combination.id) || combination.id === "*") {
      return { where: `combinations[${j}].id`, message: `combination id "${combination.id}" is already used (ids are unique across cases and combinations; "*" is reserved)` };
    }
    seen.add(combination.id);
    for (const key of Object.keys(combination.factors)) {
      if (!caseIds.has(key)) return { where: `combinations[${j}].factors.${key}`, message: `combination "${combination.id}" refers to load case "${key}", which does not exist` };
    }
  }
  return undefined;
}

function checkStations(model: BeamModel): Problem | undefined {
  const x0 = model.nodes[0]!.x;
  const xEnd = model.nodes[model.nodes.length - 1]!.x;
  const stations = model.stations ?? [];
  for (let i = 0; i < stations.length; i++) {
    const x = stations[i]!;
    if (x < x0 || x > xEnd) return { where: `stations[${i}]`, message: `station x = ${x} m lies outside the beam: it runs from x = ${x0} m to ${xEnd} m` };
  }
  return undefined;
}
