import type { BeamModel } from "./beamModelSchema.js";
import type { Analysis, AnalysisCase, AnalysisCombination, Curve } from "./analysisTypes.js";
import { assembleStiffness, segmentSections } from "./assembleStiffness.js";
import { factorBanded, solveFactored } from "./bandedMatrix.js";
import { findRigidMotion } from "./checkStability.js";
import { describeMechanism } from "./describeMechanism.js";
import { fail, ok, unwrap, type Result } from "./errors.js";
import { buildBases, buildLoadGrid, type BasisLoads } from "./loadGrid.js";
import { elementDofs, numberDofs } from "./numberDofs.js";
import { COEFFICIENTS_PER_INTERVAL, equivalentNodalLoads, marchSegment, solveStartForces } from "./segmentField.js";
import { balanceChains, recoverReactions, REFINEMENT_STEPS, residual, type SolveContext as Context } from "./recoverForces.js";
import { validateModel } from "./validateModel.js";
import { viewsOf } from "./workBuffers.js";

/**
 * Solves a validated model: factors the banded stiffness once, then solves every load case (and
 * every span piece of a patterned case) as another right-hand side, and builds the exact fields
 * of each case and combination. Fails with `mechanism` when the beam cannot carry load.
 */
export function analyzeModel(model: BeamModel): Result<Analysis> {
  const dofs = numberDofs(model);
  const rigidMotion = findRigidMotion(model, dofs);
  if (rigidMotion) return { ok: false, error: describeMechanism(model, dofs, rigidMotion) };
  const sections = segmentSections(model);
  const system = assembleStiffness(model, dofs, sections);
  const factored = factorBanded(system.stiffness);
  if (!factored.ok) return { ok: false, error: describeMechanism(model, dofs, factored.mode) };
  const supportedNodes = model.nodes.flatMap((node, i) => (node.support ? [i] : []));
  if (supportedNodes.length === 0) return fail("mechanism", "the beam cannot carry load: it has no supports", "nodes");
  const grid = buildLoadGrid(model);
  const lengths = Float64Array.from(sections, (_, e) => model.nodes[e + 1]!.x - model.nodes[e]!.x);
  const context: Context = { model, grid, dofs, sections, lengths, system, factors: factored.factors, supportedNodes };
  const bases = buildBases(model, grid);
  const size = curveSize(context);
  const buffer = new Float64Array(size * bases.length);
  const scratch = createScratch(context);
  const curves = bases.map((basis, b) => solveBasis(context, basis, curveAt(context, buffer, b * size), scratch));
  // combined curves (cases of several pieces, combinations) share one buffer, as the bases do
  const take = viewsOf(size * (model.loadCases.length + model.combinations.length));
  const target = () => curveAt(context, take(size), 0);
  const cases: AnalysisCase[] = model.loadCases.map((loadCase, caseIndex) => {
    const pieces = bases.flatMap((basis, b) => (basis.caseIndex === caseIndex ? [{ span: basis.span, curve: curves[b]! }] : []));
    const curve = combineCurves(pieces.map((p) => ({ curve: p.curve, factor: 1 })), target);
    return { id: loadCase.id, category: loadCase.category, pattern: loadCase.pattern === true, curve, pieces: loadCase.pattern ? pieces : [] };
  });
  const caseIndexById = new Map(cases.map((c, i) => [c.id, i]));
  const combinations: AnalysisCombination[] = model.combinations.map((combination) => {
    const factors = Object.entries(combination.factors).map(([id, factor]) => ({ caseIndex: caseIndexById.get(id)!, factor }));
    const curve = combineCurves(factors.map((f) => ({ curve: cases[f.caseIndex]!.curve, factor: f.factor })), target);
    return { id: combination.id, factors, curve };
  });
  return ok({
    theory: model.theory,
    nodes: model.nodes.map((node) => ({ x: node.x, hinge: node.hinge === true, support: node.support?.type ?? null })),
    supportedNodes,
    spans: grid.spans,
    grid: grid.x,
    cases,
    combinations,
    stations: model.stations ?? [],
  });
}

/** Validates then analyses; expected failures come back as values. */
export function tryAnalyze(input: unknown): Result<Analysis> {
  const validated = validateModel(input);
  return validated.ok ? analyzeModel(validated.value) : validated;
}

/**
 * Analyses a validated model for the editor (results, envelopes and diagrams are read from it
 * with `valuesAt`, `envelopeAt`, `diagram`, …). Throws `SolverError` with code `mechanism`.
 */
export function analyze(model: BeamModel): Analysis {
  return unwrap(analyzeModel(model));
}

/** Doubles per curve: coefficients, three nodal arrays and two reaction arrays. */
function curveSize(context: Context): number {
  const n = context.model.nodes.length;
  return (context.grid.x.length - 1) * COEFFICIENTS_PER_INTERVAL + 3 * n + 2 * context.supportedNodes.length;
}

/**
 * A zeroed curve as views into `buffer` at `start`: one allocation serves many curves (small
 * typed arrays each cost an allocation and GC work), and structured clone copies a shared
 * buffer once.
 */
function curveAt(context: Context, buffer: Float64Array, start: number): Curve {
  const n = context.model.nodes.length;
  const m = context.supportedNodes.length;
  let at = start;
  const take = (length: number) => buffer.subarray(at, (at += length));
  const coef = take((context.grid.x.length - 1) * COEFFICIENTS_PER_INTERVAL);
  return { coef, uy: take(n), rzLeft: take(n), rzRight: take(n), fy: take(m), mz: take(m) };
}

/** Σ factor · curve into a zeroed curve from `target` (a single unfactored term is itself). */
function combineCurves(terms: { curve: Curve; factor: number }[], target: () => Curve): Curve {
  if (terms.length === 1 && terms[0]!.factor === 1) return terms[0]!.curve;
  const out = target();
  for (const { curve, factor } of terms) {
    for (const key of ["coef", "uy", "rzLeft", "rzRight", "fy", "mz"] as const) {
      const target = out[key];
      const source = curve[key];
      for (let i = 0; i < target.length; i++) target[i]! += factor * source[i]!;
    }
  }
  return out;
}

/** Work arrays reused by every right-hand side of one analysis. */
interface Scratch {
  particular: Float64Array;
  state: Float64Array;
  equivalent: Float64Array;
  rhs: Float64Array;
  loads: Float64Array;
  correction: Float64Array;
  settled: Float64Array;
  startV: Float64Array;
  startM: Float64Array;
  endV: Float64Array;
  endM: Float64Array;
}

function createScratch(context: Context): Scratch {
  const nSeg = context.sections.length;
  const nDof = context.dofs.count;
  return {
    particular: new Float64Array(4 * nSeg),
    state: new Float64Array(4),
    equivalent: new Float64Array(4),
    rhs: new Float64Array(nDof),
    loads: new Float64Array(nDof),
    correction: new Float64Array(nDof),
    settled: new Float64Array(nSeg + 1),
    startV: new Float64Array(nSeg + 1),
    startM: new Float64Array(nSeg + 1),
    endV: new Float64Array(nSeg + 1),
    endM: new Float64Array(nSeg + 1),
  };
}

function addToFree(rhs: Float64Array, dof: number, v: number): void {
  if (dof >= 0) rhs[dof]! += v;
}

/** Right-hand side of one basis: equivalent nodal loads of span loads plus loads at nodes. */
function assembleLoads(context: Context, basis: BasisLoads, scratch: Scratch): void {
  const { grid, dofs, sections, lengths } = context;
  const { particular, state, equivalent, rhs } = scratch;
  rhs.fill(0);
  for (let e = 0; e < sections.length; e++) {
    state.fill(0);
    marchSegment(grid, basis, e, sections[e]!, state);
    particular.set(state, 4 * e);
    if (state[0] === 0 && state[1] === 0 && state[2] === 0 && state[3] === 0) continue;
    equivalentNodalLoads(lengths[e]!, sections[e]!, state, equivalent);
    addToFree(rhs, dofs.uy[e]!, equivalent[0]!);
    addToFree(rhs, dofs.rzRight[e]!, equivalent[1]!);
    addToFree(rhs, dofs.uy[e + 1]!, equivalent[2]!);
    addToFree(rhs, dofs.rzLeft[e + 1]!, equivalent[3]!);
  }
  for (let j = 0; j < grid.pointNode.length; j++) {
    const node = grid.pointNode[j]!;
    if (node < 0) continue;
    addToFree(rhs, dofs.uy[node]!, basis.fy[j]!);
    addToFree(rhs, dofs.rzRight[node]!, basis.mz[j]!);
  }
}

function readNodalValues(context: Context, scratch: Scratch, curve: Curve): void {
  const { dofs } = context;
  const { rhs, settled } = scratch;
  for (let i = 0; i < curve.uy.length; i++) {
    const uy = dofs.uy[i]!;
    const left = dofs.rzLeft[i]!;
    const right = dofs.rzRight[i]!;
    curve.uy[i] = uy >= 0 ? rhs[uy]! : settled[i]!;
    curve.rzLeft[i] = left >= 0 ? rhs[left]! : 0;
    curve.rzRight[i] = right >= 0 ? rhs[right]! : 0;
  }
}

function solveBasis(context: Context, basis: BasisLoads, curve: Curve, scratch: Scratch): Curve {
  const { grid, dofs, sections, lengths, system } = context;
  const nSeg = sections.length;
  const { particular, state, rhs, loads, correction, settled, startV, startM, endV, endM } = scratch;
  assembleLoads(context, basis, scratch);
  // The residual below uses the full nodal displacements, so it takes the loads before the
  // settlements are moved to the right-hand side as −K_fr·u_r.
  loads.set(rhs);
  settled.fill(0);
  for (const { node, uy } of basis.settlements) settled[node]! += uy;
  for (const node of new Set(basis.settlements.map((s) => s.node))) {
    for (const [e, local] of [
      [node - 1, 2],
      [node, 0],
    ] as const) {
      if (e < 0 || e >= nSeg) continue;
      const map = elementDofs(dofs, e);
      for (let a = 0; a < 4; a++) addToFree(rhs, map[a]!, -system.elements[16 * e + 4 * a + local]! * settled[node]!);
    }
  }
  solveFactored(context.factors, rhs);
  readNodalValues(context, scratch, curve);
  for (let step = 0; step < REFINEMENT_STEPS; step++) {
    residual(context, curve, loads, correction);
    solveFactored(context.factors, correction);
    for (let d = 0; d < rhs.length; d++) rhs[d]! += correction[d]!;
    readNodalValues(context, scratch, curve);
  }
  endV[0] = 0;
  endM[0] = 0;
  for (let e = 0; e < nSeg; e++) {
    const { V0, M0 } = solveStartForces(lengths[e]!, sections[e]!, particular, curve.uy[e]!, curve.rzRight[e]!, curve.uy[e + 1]!, curve.rzLeft[e + 1]!, 4 * e);
    startV[e] = V0;
    startM[e] = M0;
  }
  balanceChains(context, basis, particular, startV, startM);
  for (let e = 0; e < nSeg; e++) {
    state[0] = startV[e]!;
    state[1] = startM[e]!;
    state[2] = curve.rzRight[e]!;
    state[3] = curve.uy[e]!;
    marchSegment(grid, basis, e, sections[e]!, state, curve.coef);
    endV[e + 1] = state[0]!;
    endM[e + 1] = state[1]!;
  }
  recoverReactions(context, basis, curve, startV, startM, endV, endM);
  return curve;
}
