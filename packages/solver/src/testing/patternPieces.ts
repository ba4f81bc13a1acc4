/**
 * Span pieces of a patterned load case, per the exchange format: a span is the stretch between two
 * consecutive supported nodes, each overhang beyond the first or last support is a span too; a
 * point load (or moment) exactly at a support belongs to the span on its right, or to the last span
 * at the right end; distributed loads are cut at support positions, intensity interpolated.
 */
import type { LoadSpec, NodeSpec } from "./exchange";

export interface Span {
  x1: number;
  x2: number;
}

export function spansOf(nodes: readonly NodeSpec[]): Span[] {
  const bounds = [nodes[0]!.x, ...nodes.filter((n) => n.support).map((n) => n.x), nodes[nodes.length - 1]!.x];
  const unique = [...new Set(bounds)].sort((a, b) => a - b);
  return unique.slice(1).map((x2, i) => ({ x1: unique[i]!, x2 }));
}

function spanIndexAt(spans: readonly Span[], x: number): number {
  const i = spans.findIndex((s) => x >= s.x1 && x < s.x2);
  return i >= 0 ? i : spans.length - 1;
}

/** Splits loads into one list per span; settlements have no span and are rejected. */
export function splitIntoSpans(spans: readonly Span[], loads: readonly LoadSpec[]): LoadSpec[][] {
  const pieces: LoadSpec[][] = spans.map(() => []);
  for (const load of loads) {
    switch (load.type) {
      case "point":
      case "moment":
        pieces[spanIndexAt(spans, load.x)]!.push(load);
        break;
      case "distributed": {
        const q = (x: number) => load.qy1 + ((load.qy2 - load.qy1) * (x - load.x1)) / (load.x2 - load.x1);
        spans.forEach((s, i) => {
          const a = Math.max(s.x1, load.x1);
          const b = Math.min(s.x2, load.x2);
          if (b > a) pieces[i]!.push({ type: "distributed", x1: a, x2: b, qy1: a === load.x1 ? load.qy1 : q(a), qy2: b === load.x2 ? load.qy2 : q(b) });
        });
        break;
      }
      case "settlement":
        throw new Error("a settlement has no span; keep it out of patterned cases");
      default: {
        const never: never = load;
        throw new Error(`unknown load ${JSON.stringify(never)}`);
      }
    }
  }
  return pieces;
}

/** Loads of the spans whose bit is set in `mask`. */
export function loadsOfArrangement(pieces: readonly LoadSpec[][], mask: number): LoadSpec[] {
  return pieces.flatMap((p, i) => ((mask >> i) & 1 ? p : []));
}
