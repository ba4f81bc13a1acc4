import type { BeamLoad, BeamModel, BeamSegment, LoadCategory, SupportSpec } from "./exchange.js";
import { listSpans, spansOfLoad } from "./spans.js";

/**
 * Structured difference between two beam models (before → after), for the compare view and for
 * the one-line change summary of a revision. Positions are SI metres, values SI as in the models.
 */
export type ModelChange =
  | { kind: "theory"; before: string; after: string }
  | { kind: "span-count"; before: number; after: number }
  | { kind: "span-length"; span: number; before: number; after: number }
  | { kind: "node-added" | "node-removed"; x: number; support?: SupportSpec; hinge: boolean }
  | { kind: "node-moved"; before: number; after: number }
  | { kind: "support-added" | "support-removed"; x: number; support: SupportSpec }
  | { kind: "support-changed"; x: number; before: SupportSpec; after: SupportSpec }
  | { kind: "hinge-added" | "hinge-removed"; x: number }
  | { kind: "section-changed"; x1: number; x2: number; before: BeamSegment; after: BeamSegment }
  | { kind: "case-added" | "case-removed"; caseId: string; category: LoadCategory }
  | { kind: "case-category"; caseId: string; before: LoadCategory; after: LoadCategory }
  | { kind: "case-pattern"; caseId: string; after: boolean }
  | { kind: "load-added" | "load-removed"; caseId: string; load: BeamLoad; spans: number[]; x?: number }
  | { kind: "load-changed"; caseId: string; before: BeamLoad; after: BeamLoad; spans: number[]; x?: number }
  | { kind: "combination-added" | "combination-removed"; id: string; factors: Record<string, number> }
  | { kind: "combination-changed"; id: string; before: Record<string, number>; after: Record<string, number> };

export type ModelChangeKind = ModelChange["kind"];

export interface ModelDiff {
  changes: ModelChange[];
}

// Positions typed in different units round-trip through floating point; 1 µm is "the same place".
const SAME_X = 1e-6;

/** Plain-data equality regardless of key order: a model read back from PostgreSQL jsonb has its keys reordered. */
function same(a: unknown, b: unknown): boolean {
  if (a === b) return true;
  if (typeof a !== "object" || typeof b !== "object" || a === null || b === null) return false;
  if (Array.isArray(a) !== Array.isArray(b)) return false;
  const ka = Object.keys(a);
  const kb = Object.keys(b);
  if (ka.length !== kb.length) return false;
  return ka.every((k) => Object.prototype.hasOwnProperty.call(b, k) && same((a as Record<string, unknown>)[k], (b as Record<string, unknown>)[k]));
}

function diffNodes(before: BeamModel, after: BeamModel, out: ModelChange[]): void {
  const pairs: Array<[BeamModel["nodes"][number], BeamModel["nodes"][number]]> = [];
  if (before.nodes.length === after.nodes.length) {
    // Same node count: nodes correspond by order, so a moved support reads as span lengths.
    before.nodes.forEach((b, i) => pairs.push([b, after.nodes[i]!]));
    pairs.forEach(([b, a]) => {
      if (Math.abs(b.x - a.x) > SAME_X && !b.support && !a.support && a !== after.nodes[after.nodes.length - 1] && a !== after.nodes[0]) {
        out.push({ kind: "node-moved", before: b.x, after: a.x });
      }
    });
  } else {
    for (const b of before.nodes) {
      const a = after.nodes.find((n) => Math.abs(n.x - b.x) <= SAME_X);
      if (a) pairs.push([b, a]);
      else out.push({ kind: "node-removed", x: b.x, hinge: b.hinge === true, ...(b.support ? { support: b.support } : {}) });
    }
    for (const a of after.nodes) {
      if (!before.nodes.some((n) => Math.abs(n.x - a.x) <= SAME_X)) {
        out.push({ kind: "node-added", x: a.x, hinge: a.hinge === true, ...(a.support ? { support: a.support } : {}) });
      }
    }
  }
  for (const [b, a] of pairs) {
    if (b.support && !a.support) out.push({ kind: "support-removed", x: a.x, support: b.support });
    else if (!b.support && a.support) out.push({ kind: "support-added", x: a.x, support: a.support });
    else if (b.support && a.support && !same(b.support, a.support)) {
      out.push({ kind: "support-changed", x: a.x, before: b.support, after: a.support });
    }
    if (!b.hinge && a.hinge) out.push({ kind: "hinge-added", x: a.x });
    if (b.hinge && !a.hinge) out.push({ kind: "hinge-removed", x: a.x });
  }
}

function diffSpans(before: BeamModel, after: BeamModel, out: ModelChange[]): void {
  const b = listSpans(before);
  const a = listSpans(after);
  if (b.length !== a.length) {
    out.push({ kind: "span-count", before: b.length, after: a.length });
    return;
  }
  b.forEach((span, i) => {
    const next = a[i]!;
    const lengthBefore = span.x2 - span.x1;
    const lengthAfter = next.x2 - next.x1;
    if (Math.abs(lengthBefore - lengthAfter) > SAME_X) {
      out.push({ kind: "span-length", span: span.number, before: lengthBefore, after: lengthAfter });
    }
  });
}

function diffSegments(before: BeamModel, after: BeamModel, out: ModelChange[]): void {
  after.segments.forEach((seg, i) => {
    const x1 = after.nodes[i]?.x ?? 0;
    const x2 = after.nodes[i + 1]?.x ?? x1;
    // The segment of the old model that held this segment's midpoint.
    const mid = (x1 + x2) / 2;
    const j = before.nodes.findIndex((n, k) => n.x <= mid && (before.nodes[k + 1]?.x ?? -Infinity) > mid);
    // Same node count: segments correspond by order, as nodes do.
    const old = before.nodes.length === after.nodes.length ? before.segments[i] : j >= 0 ? before.segments[j] : undefined;
    if (old && !same(old, seg)) out.push({ kind: "section-changed", x1, x2, before: old, after: seg });
  });
}

function loadKey(load: BeamLoad): string {
  switch (load.type) {
    case "point":
    case "moment":
      return `${load.type}@${load.x}`;
    case "distributed":
      return `${load.type}@${load.x1}..${load.x2}`;
    case "settlement":
      return `${load.type}@${load.node}`;
    default: {
      const never: never = load;
      return never;
    }
  }
}

function loadX(load: BeamLoad): number | undefined {
  return load.type === "point" || load.type === "moment" ? load.x : undefined;
}

function diffLoads(caseId: string, before: BeamModel, after: BeamModel, b: BeamLoad[], a: BeamLoad[], out: ModelChange[]): void {
  const spansBefore = listSpans(before);
  const spansAfter = listSpans(after);
  const left = [...b];
  const right = [...a];
  const take = (match: (x: BeamLoad, y: BeamLoad) => boolean, onPair: (x: BeamLoad, y: BeamLoad) => void) => {
    for (let i = 0; i < left.length; ) {
      const j = right.findIndex((y) => match(left[i]!, y));
      if (j < 0) {
        i++;
        continue;
      }
      onPair(left[i]!, right[j]!);
      left.splice(i, 1);
      right.splice(j, 1);
    }
  };
  const changed = (x: BeamLoad, y: BeamLoad) => {
    const at = loadX(y);
    out.push({ kind: "load-changed", caseId, before: x, after: y, spans: spansOfLoad(after, spansAfter, y), ...(at === undefined ? {} : { x: at }) });
  };
  // Unchanged loads first, then loads at the same place with a new value, then same type moved.
  take(same, () => undefined);
  take((x, y) => loadKey(x) === loadKey(y), changed);
  take((x, y) => x.type === y.type, changed);
  for (const load of left) {
    const at = loadX(load);
    out.push({ kind: "load-removed", caseId, load, spans: spansOfLoad(before, spansBefore, load), ...(at === undefined ? {} : { x: at }) });
  }
  for (const load of right) {
    const at = loadX(load);
    out.push({ kind: "load-added", caseId, load, spans: spansOfLoad(after, spansAfter, load), ...(at === undefined ? {} : { x: at }) });
  }
}

function diffCases(before: BeamModel, after: BeamModel, out: ModelChange[]): void {
  for (const b of before.loadCases) {
    if (!after.loadCases.some((c) => c.id === b.id)) out.push({ kind: "case-removed", caseId: b.id, category: b.category });
  }
  for (const a of after.loadCases) {
    const b = before.loadCases.find((c) => c.id === a.id);
    if (!b) {
      out.push({ kind: "case-added", caseId: a.id, category: a.category });
      diffLoads(a.id, before, after, [], a.loads, out);
      continue;
    }
    if (b.category !== a.category) out.push({ kind: "case-category", caseId: a.id, before: b.category, after: a.category });
    if ((b.pattern === true) !== (a.pattern === true)) out.push({ kind: "case-pattern", caseId: a.id, after: a.pattern === true });
    diffLoads(a.id, before, after, b.loads, a.loads, out);
  }
}

function diffCombinations(before: BeamModel, after: BeamModel, out: ModelChange[]): void {
  for (const b of before.combinations) {
    if (!after.combinations.some((c) => c.id === b.id)) out.push({ kind: "combination-removed", id: b.id, factors: b.factors });
  }
  for (const a of after.combinations) {
    const b = before.combinations.find((c) => c.id === a.id);
    if (!b) out.push({ kind: "combination-added", id: a.id, factors: a.factors });
    else {
      const keys = new Set([...Object.keys(a.factors), ...Object.keys(b.factors)]);
      if ([...keys].some((k) => (a.factors[k] ?? 0) !== (b.factors[k] ?? 0))) {
        out.push({ kind: "combination-changed", id: a.id, before: b.factors, after: a.factors });
      }
    }
  }
}

/** Everything that changed from `before` to `after`, geometry first, then loads. */
export function diffModels(before: BeamModel, after: BeamModel): ModelDiff {
  const changes: ModelChange[] = [];
  const theoryBefore = before.theory ?? "euler-bernoulli";
  const theoryAfter = after.theory ?? "euler-bernoulli";
  if (theoryBefore !== theoryAfter) changes.push({ kind: "theory", before: theoryBefore, after: theoryAfter });
  diffSpans(before, after, changes);
  diffNodes(before, after, changes);
  diffSegments(before, after, changes);
  diffCases(before, after, changes);
  diffCombinations(before, after, changes);
  return { changes };
}
