import type { IShape } from "@spanwright/solver/design";
import type { ExchangeModel } from "../editor/model/exchange";

/**
 * Invented test beam: one simple span on pins, a uniform dead case D and a uniform live case L
 * (loads in N/m, downward positive here; stored negative as the exchange format has them).
 */
export function simpleSpanDeadLive(options: {
  span: number;
  dead: number;
  live: number;
  I: number;
  combinations: ExchangeModel["combinations"];
  title?: string;
}): ExchangeModel {
  const { span, dead, live, I, combinations, title } = options;
  const uniform = (q: number) => [{ type: "distributed" as const, x1: 0, x2: span, qy1: -q, qy2: -q }];
  return {
    format: "spanwright.beam/1",
    ...(title ? { title } : {}),
    nodes: [
      { x: 0, support: { type: "pinned" } },
      { x: span, support: { type: "pinned" } },
    ],
    segments: [{ E: 200e9, I }],
    loadCases: [
      { id: "D", category: "dead", loads: uniform(dead) },
      { id: "L", category: "live", loads: uniform(live) },
    ],
    combinations,
  };
}

/** Plates of a W410×46-like rolled shape (approximate, from memory): invented test values. */
export const wShape: IShape = { kind: "i-shape", d: 0.403, bf: 0.14, tf: 0.0112, tw: 0.007 };
