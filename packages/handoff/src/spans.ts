import type { BeamLoad, BeamModel } from "./exchange.js";

/**
 * Spans as the contract defines them for pattern loading: the stretch between two consecutive
 * supported nodes, and each overhang beyond the first or last support. Numbered from 1, left to
 * right, as engineers count them.
 */
export interface Span {
  number: number;
  x1: number;
  x2: number;
  overhang: boolean;
}

export function listSpans(model: BeamModel): Span[] {
  const xs = model.nodes.filter((n) => n.support).map((n) => n.x);
  const start = model.nodes[0]?.x ?? 0;
  const end = model.nodes[model.nodes.length - 1]?.x ?? start;
  const spans: Array<Omit<Span, "number">> = [];
  const first = xs[0];
  const last = xs[xs.length - 1];
  if (first === undefined || last === undefined) return [{ number: 1, x1: start, x2: end, overhang: false }];
  if (first > start) spans.push({ x1: start, x2: first, overhang: true });
  for (let i = 1; i < xs.length; i++) spans.push({ x1: xs[i - 1]!, x2: xs[i]!, overhang: false });
  if (last < end) spans.push({ x1: last, x2: end, overhang: true });
  return spans.map((s, i) => ({ ...s, number: i + 1 }));
}

/** The span holding x; at a support, the span on its right (the last span at the right end). */
export function spanAt(spans: Span[], x: number): Span | undefined {
  return spans.find((s) => x >= s.x1 && x < s.x2) ?? spans[spans.length - 1];
}

/** Spans a load acts on, by number. */
export function spansOfLoad(model: BeamModel, spans: Span[], load: BeamLoad): number[] {
  switch (load.type) {
    case "point":
    case "moment": {
      const span = spanAt(spans, load.x);
      return span ? [span.number] : [];
    }
    case "distributed":
      return spans.filter((s) => load.x1 < s.x2 && load.x2 > s.x1).map((s) => s.number);
    case "settlement": {
      const x = model.nodes[load.node]?.x;
      const span = x === undefined ? undefined : spanAt(spans, x);
      return span ? [span.number] : [];
    }
    default: {
      const never: never = load;
      return never;
    }
  }
}
