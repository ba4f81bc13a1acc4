/**
 * Small models in the exchange format for API tests. The numbers are arbitrary but physical:
 * a steel section (E = 200 GPa, I = 8e-5 m⁴) under a gravity load (negative qy).
 */
export function twoSpanModel(qy = -10_000): Record<string, unknown> {
  return {
    format: "spanwright.beam/1",
    title: "test beam",
    nodes: [
      { x: 0, support: { type: "pinned" } },
      { x: 5, support: { type: "pinned" } },
      { x: 10, support: { type: "pinned" } },
    ],
    segments: [
      { E: 2e11, I: 8e-5 },
      { E: 2e11, I: 8e-5 },
    ],
    loadCases: [{ id: "D", category: "dead", loads: [{ type: "distributed", x1: 0, x2: 10, qy1: qy, qy2: qy }] }],
    combinations: [],
  };
}

/** Segment 1 has a negative second moment of area: the solver must reject it as `invalid-model`. */
export function invalidModel(): Record<string, unknown> {
  const model = twoSpanModel();
  (model.segments as Array<Record<string, number>>)[1] = { E: 2e11, I: -1 };
  return model;
}

/** One support only, no fixity: the beam cannot carry load. */
export function mechanismModel(): Record<string, unknown> {
  return {
    format: "spanwright.beam/1",
    nodes: [{ x: 0, support: { type: "pinned" } }, { x: 4 }],
    segments: [{ E: 2e11, I: 8e-5 }],
    loadCases: [{ id: "D", category: "dead", loads: [{ type: "point", x: 2, fy: -1000 }] }],
  };
}
