import type { BeamDocument } from "../model/BeamDocument";
import type { SolveFailure } from "./solveMessages";

export interface ErrorRange {
  readonly x1: number;
  readonly x2: number;
}

const X_RANGE = /x = (-?[\d.]+(?:e[+-]?\d+)?) m to (-?[\d.]+(?:e[+-]?\d+)?) m/;
const INDEXED = /^(nodes|segments)\[(\d+)\]/;
const LOAD_PATH = /^loadCases\[(\d+)\]\.loads\[(\d+)\]/;

/**
 * The stretch of beam (m) an engine error points at, to highlight in place: a mechanism names an
 * x range; an invalid-model path names a node, a segment or a load. Null when it names no place.
 */
export function locateError(error: SolveFailure, doc: BeamDocument): ErrorRange | null {
  const range = X_RANGE.exec(error.where) ?? X_RANGE.exec(error.message);
  if (range) return { x1: Number(range[1]), x2: Number(range[2]) };
  const indexed = INDEXED.exec(error.where);
  if (indexed) {
    const i = Number(indexed[2]);
    if (indexed[1] === "nodes") {
      const node = doc.nodes[i];
      return node ? { x1: node.x, x2: node.x } : null;
    }
    const a = doc.nodes[i];
    const b = doc.nodes[i + 1];
    return a && b ? { x1: a.x, x2: b.x } : null;
  }
  const load = LOAD_PATH.exec(error.where);
  if (load) {
    const l = doc.loadCases[Number(load[1])]?.loads[Number(load[2])];
    if (!l) return null;
    if (l.type === "distributed") return { x1: l.x1, x2: l.x2 };
    if (l.type === "settlement") {
      const node = doc.nodes.find((n) => n.id === l.node);
      return node ? { x1: node.x, x2: node.x } : null;
    }
    return { x1: l.x, x2: l.x };
  }
  return null;
}
