/**
 * fast-check arbitraries of valid beam models in the exchange format: 2–6 spans (an overhang
 * counts as a span), mixed supports including springs, hinges only where the beam stays stable
 * (checked by `isStable`), and point, moment and linearly varying loads that cross nodes.
 * Magnitudes are building-scale (kN, kN/m, steel and timber sections) in SI base units.
 */
import fc from "fast-check";
import type { BeamModel, LoadSpec, NodeSpec, SegmentSpec, SupportSpec } from "./exchange";
import { isStable } from "./stability";

export interface BeamShape {
  nodes: NodeSpec[];
  segments: SegmentSpec[];
  theory: "euler-bernoulli" | "timoshenko";
}

export interface ShapeOptions {
  /** Guided supports (a guided node is a "supported node", so it bounds a pattern span). */
  allowGuided?: boolean;
  /** Timoshenko segments (A, G, shearFactor) on some beams. */
  allowTimoshenko?: boolean;
}

const length = fc.integer({ min: 8, max: 40 }).map((q) => q / 4); // 2 m … 10 m in 0.25 m steps

function supportArb(allowGuided: boolean): fc.Arbitrary<SupportSpec> {
  const choices: fc.WeightedArbitrary<SupportSpec>[] = [
    { weight: 10, arbitrary: fc.constant({ type: "pinned" as const }) },
    { weight: 3, arbitrary: fc.constant({ type: "fixed" as const }) },
    { weight: 3, arbitrary: fc.integer({ min: 5, max: 8 }).map((e) => ({ type: "spring" as const, ky: 10 ** e })) },
    {
      weight: 1,
      arbitrary: fc
        .tuple(fc.integer({ min: 5, max: 8 }), fc.integer({ min: 5, max: 8 }))
        .map(([a, b]) => ({ type: "spring" as const, ky: 2 * 10 ** a, kr: 3 * 10 ** b })),
    },
  ];
  if (allowGuided) choices.push({ weight: 1, arbitrary: fc.constant({ type: "guided" as const }) });
  return fc.oneof(...choices);
}

const steel = fc.record({ E: fc.constant(2.0e11), I: fc.integer({ min: 10, max: 400 }).map((v) => v * 1e-6) });
const timber = fc.record({ E: fc.constant(1.2e10), I: fc.integer({ min: 100, max: 2000 }).map((v) => v * 1e-6) });

/** Shear properties for Timoshenko beams: a deep section so shear deflection matters. */
const shear = fc.record({
  A: fc.integer({ min: 20, max: 200 }).map((v) => v * 1e-4),
  G: fc.constant(7.7e10),
  shearFactor: fc.constantFrom(5 / 6, 0.45, 0.9),
});

/** Beams of 2–6 spans; each span may carry up to two unsupported interior nodes. */
export function beamShapeArb(opts: ShapeOptions = {}): fc.Arbitrary<BeamShape> {
  const { allowGuided = true, allowTimoshenko = true } = opts;
  return fc
    .record({
      supportCount: fc.integer({ min: 2, max: 5 }),
      overhangs: fc.tuple(fc.boolean(), fc.boolean()),
      lengths: fc.array(length, { minLength: 6, maxLength: 6 }),
      inner: fc.array(fc.array(fc.integer({ min: 1, max: 19 }), { maxLength: 2 }), { minLength: 6, maxLength: 6 }),
      supports: fc.array(supportArb(allowGuided), { minLength: 5, maxLength: 5 }),
      hingeWish: fc.array(fc.boolean(), { minLength: 20, maxLength: 20 }),
      sections: fc.array(fc.oneof(steel, timber), { minLength: 20, maxLength: 20 }),
      timoshenko: allowTimoshenko ? fc.boolean() : fc.constant(false),
      shearProps: shear,
    })
    .map((g) => {
      const [left, wantRight] = g.overhangs;
      // At least two spans: a single span between two supports gets a right overhang.
      const useRight = wantRight || (g.supportCount === 2 && !left);
      const spanCount = g.supportCount - 1 + (left ? 1 : 0) + (useRight ? 1 : 0);
      const nodes: NodeSpec[] = [];
      let x = 0;
      let supportIndex = 0;
      const pushSupport = () => nodes.push({ x, support: g.supports[supportIndex++]! });
      for (let s = 0; s < spanCount; s++) {
        const isLeftOverhang = left && s === 0;
        if (isLeftOverhang) nodes.push({ x });
        else pushSupport();
        const L = g.lengths[s]!;
        const fractions = [...new Set(g.inner[s]!)].sort((a, b) => a - b);
        for (const f of fractions) nodes.push({ x: x + (L * f) / 20 });
        x += L;
      }
      if (useRight) nodes.push({ x });
      else pushSupport();
      makeStable(nodes);
      addHinges(nodes, g.hingeWish);
      const theory = g.timoshenko ? ("timoshenko" as const) : ("euler-bernoulli" as const);
      const segments = nodes.slice(1).map((_, i) => ({ ...g.sections[i]!, ...(g.timoshenko ? g.shearProps : {}) }));
      return { nodes, segments, theory };
    });
}

/** Two guided supports (or springs only rotating) can leave a mechanism: pin the outer supports. */
function makeStable(nodes: NodeSpec[]): void {
  if (isStable(nodes)) return;
  const supported = nodes.filter((n) => n.support);
  supported[0]!.support = { type: "pinned" };
  supported[supported.length - 1]!.support = { type: "pinned" };
}

function canHinge(n: NodeSpec): boolean {
  const s = n.support;
  if (!s) return true;
  if (s.type === "pinned") return true;
  return s.type === "spring" && !(s.kr ?? 0);
}

/** Adds each wished hinge that keeps the beam stable; greedy, left to right. */
function addHinges(nodes: NodeSpec[], wish: boolean[]): void {
  for (let i = 1; i < nodes.length - 1; i++) {
    const n = nodes[i]!;
    if (!wish[i] || !canHinge(n)) continue;
    n.hinge = true;
    if (!isStable(nodes)) delete n.hinge;
  }
}

/** A load position anywhere on the beam, sometimes exactly on a node. */
function positionArb(nodes: NodeSpec[]): fc.Arbitrary<number> {
  const x0 = nodes[0]!.x;
  const x1 = nodes[nodes.length - 1]!.x;
  return fc.oneof({ weight: 3, arbitrary: gridPoint(x0, x1) }, { weight: 1, arbitrary: fc.constantFrom(...nodes.map((n) => n.x)) });
}

/** Positions on a 1 mm grid, as an engineer would type them (no denormal or 1e-300 offsets). */
function gridPoint(x0: number, x1: number): fc.Arbitrary<number> {
  return fc.integer({ min: 0, max: Math.round((x1 - x0) * 1000) }).map((k) => Math.min(x1, x0 + k / 1000));
}

const force = fc.integer({ min: -60, max: 20 }).map((k) => k * 1000 + 250); // N, never zero
const moment = fc.integer({ min: -40, max: 40 }).map((k) => k * 1000 + 125); // N·m
const intensity = fc.integer({ min: -30, max: 10 }).map((k) => k * 1000); // N/m

export interface LoadOptions {
  /** Settlements need a node whose support restrains uy (pinned or fixed). */
  allowSettlement?: boolean;
  /** Moments exactly at a support have no stated span for pattern loading; avoid them there. */
  momentsOffNodes?: boolean;
}

export function loadsArb(nodes: NodeSpec[], opts: LoadOptions = {}, maxLength = 5): fc.Arbitrary<LoadSpec[]> {
  const pos = positionArb(nodes);
  const x0 = nodes[0]!.x;
  const xEnd = nodes[nodes.length - 1]!.x;
  const settleable = nodes.flatMap((n, i) => (n.support?.type === "pinned" || n.support?.type === "fixed" ? [i] : []));
  const nodeXs = new Set(nodes.map((n) => n.x));
  const kinds: fc.Arbitrary<LoadSpec>[] = [
    fc.record({ type: fc.constant("point" as const), x: pos, fy: force }),
    fc
      .record({ type: fc.constant("moment" as const), x: opts.momentsOffNodes ? gridPoint(x0, xEnd) : pos, mz: moment })
      .filter((m) => !opts.momentsOffNodes || !nodeXs.has(m.x)),
    fc
      .record({ a: pos, b: pos, qy1: intensity, qy2: intensity })
      .filter(({ a, b }) => Math.abs(a - b) > 1e-3)
      .map(({ a, b, qy1, qy2 }) => ({ type: "distributed" as const, x1: Math.min(a, b), x2: Math.max(a, b), qy1, qy2 })),
  ];
  if (opts.allowSettlement && settleable.length > 0) {
    kinds.push(fc.record({ type: fc.constant("settlement" as const), node: fc.constantFrom(...settleable), uy: fc.integer({ min: -20, max: 5 }).map((k) => k * 1e-3 + 5e-4) }));
  }
  // One settlement per node and case: repeated settlements of one node have no stated meaning.
  return fc
    .array(fc.oneof(...kinds), { minLength: 1, maxLength })
    .map((loads) => loads.filter((l, i) => l.type !== "settlement" || loads.findIndex((o) => o.type === "settlement" && o.node === l.node) === i));
}

/** Station positions strictly inside the beam plus every node position. */
export function stationsArb(nodes: NodeSpec[], count = 8): fc.Arbitrary<number[]> {
  const x0 = nodes[0]!.x;
  const xEnd = nodes[nodes.length - 1]!.x;
  return fc
    .array(gridPoint(x0, xEnd), { minLength: 1, maxLength: count })
    .map((xs) => [...new Set([...xs, ...nodes.map((n) => n.x)])].sort((a, b) => a - b));
}

export function toModel(shape: BeamShape, loadCases: BeamModel["loadCases"], extra: Partial<BeamModel> = {}): BeamModel {
  return {
    format: "spanwright.beam/1",
    theory: shape.theory,
    nodes: shape.nodes,
    segments: shape.segments,
    loadCases,
    ...extra,
  };
}
