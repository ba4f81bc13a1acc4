// Stable typed ids for document records. Ids are opaque strings with a kind prefix, so a selection
// or an undo entry that names a node still names the same node after spans are inserted before it
// (array indices would not survive that).

declare const idBrand: unique symbol;
type Branded<K extends string> = string & { readonly [idBrand]: K };

export type NodeId = Branded<"node">;
export type SegmentId = Branded<"segment">;
export type LoadId = Branded<"load">;
export type CaseId = Branded<"case">;
export type CombinationId = Branded<"combination">;
export type RecordId = NodeId | SegmentId | LoadId | CaseId | CombinationId;

let fallbackCounter = 0;

/** A random suffix; crypto.randomUUID is missing outside secure contexts, hence the fallback. */
function randomSuffix(): string {
  const c = globalThis.crypto;
  if (c && typeof c.randomUUID === "function") return c.randomUUID().slice(0, 12);
  fallbackCounter += 1;
  return `${Date.now().toString(36)}${fallbackCounter.toString(36)}${Math.random().toString(36).slice(2, 8)}`;
}

function makeId<K extends string>(kind: K, suffix?: string): Branded<K> {
  return `${kind}:${suffix ?? randomSuffix()}` as Branded<K>;
}

function hasKind(kind: string, value: unknown): boolean {
  return typeof value === "string" && value.startsWith(`${kind}:`) && value.length > kind.length + 1;
}

export const createNodeId = (suffix?: string): NodeId => makeId("node", suffix);
export const createSegmentId = (suffix?: string): SegmentId => makeId("segment", suffix);
export const createLoadId = (suffix?: string): LoadId => makeId("load", suffix);
export const createCaseId = (suffix?: string): CaseId => makeId("case", suffix);
export const createCombinationId = (suffix?: string): CombinationId => makeId("combination", suffix);

export const isNodeId = (v: unknown): v is NodeId => hasKind("node", v);
export const isSegmentId = (v: unknown): v is SegmentId => hasKind("segment", v);
export const isLoadId = (v: unknown): v is LoadId => hasKind("load", v);
export const isCaseId = (v: unknown): v is CaseId => hasKind("case", v);
export const isCombinationId = (v: unknown): v is CombinationId => hasKind("combination", v);
