/** Generated beams for the benchmark: invented continuous beams, the figures of the engine's issue. */
import type { BeamModelInput } from "../src/index.js";

export const SPAN = 6;

/** An invented continuous beam: n equal spans on pins, steel section, one load case per list entry. */
export function generateBeam(spans: number, cases: BeamModelInput["loadCases"] = [], extra: Partial<BeamModelInput> = {}): BeamModelInput {
  return {
    format: "spanwright.beam/1",
    nodes: Array.from({ length: spans + 1 }, (_, i) => ({ x: i * SPAN, support: { type: "pinned" as const } })),
    segments: Array.from({ length: spans }, () => ({ E: 2e11, I: 8e-5 })),
    loadCases: cases,
    ...extra,
  };
}

export function uniform(spans: number, q: number) {
  return [{ type: "distributed" as const, x1: 0, x2: spans * SPAN, qy1: q, qy2: q }];
}

/** The interactive case: 20 spans, 6 cases, 10 combinations, 2 patterned, 100 stations per span. */
export function interactiveModel(): BeamModelInput {
  const spans = 20;
  const length = spans * SPAN;
  const point = (x: number, fy: number) => ({ type: "point" as const, x, fy });
  const cases: BeamModelInput["loadCases"] = [
    { id: "D", category: "dead", loads: [...uniform(spans, -12e3), point(15, -40e3), point(63, -25e3)] },
    { id: "SD", category: "dead", loads: [{ type: "distributed", x1: 0, x2: length, qy1: -2e3, qy2: -4e3 }] },
    { id: "L", category: "live", pattern: true, loads: uniform(spans, -15e3) },
    { id: "Lr", category: "roof-live", pattern: true, loads: [...uniform(spans, -3e3), point(33, -8e3)] },
    { id: "S", category: "snow", loads: uniform(spans, -4e3) },
    { id: "W", category: "wind", loads: [{ type: "distributed", x1: 30, x2: 90, qy1: 5e3, qy2: 5e3 }, { type: "moment", x: 45, mz: 20e3 }] },
  ];
  const f = (D: number, rest: Record<string, number>) => ({ D, SD: D, ...rest });
  const combinations = [
    { id: "C1", factors: f(1.4, {}) },
    { id: "C2", factors: f(1.2, { L: 1.6, Lr: 0.5 }) },
    { id: "C3", factors: f(1.2, { L: 1.6, S: 0.5 }) },
    { id: "C4", factors: f(1.2, { Lr: 1.6, L: 1.0 }) },
    { id: "C5", factors: f(1.2, { S: 1.6, L: 1.0 }) },
    { id: "C6", factors: f(1.2, { Lr: 1.6, W: 0.5 }) },
    { id: "C7", factors: f(1.2, { W: 1.0, L: 1.0, Lr: 0.5 }) },
    { id: "C8", factors: f(1.2, { W: 1.0, L: 1.0, S: 0.5 }) },
    { id: "C9", factors: f(0.9, { W: 1.0 }) },
    { id: "C10", factors: f(1.0, { L: 1.0, Lr: 1.0, S: 1.0 }) },
  ];
  const stations = Array.from({ length: spans * 100 }, (_, i) => (i * length) / (spans * 100));
  return generateBeam(spans, cases, { combinations, stations });
}
