import type { CaseId, CombinationId, LoadId, NodeId, SegmentId } from "./ids";
import type { UnitSystemId } from "../units/unitSystems";
import type { Material, SectionShape } from "@spanwright/solver/design";

// The open beam as plain immutable data. Values are SI (N, m, Pa, m⁴, N/m, N·m, rad) exactly as in
// the exchange format; only `units` (how to show them) is extra. Signs follow the contract: forces
// and distributed loads positive upward (gravity negative), moments positive counterclockwise.

export type Theory = "euler-bernoulli" | "timoshenko";

export type Support =
  | { readonly type: "pinned" }
  | { readonly type: "fixed" }
  | { readonly type: "guided" }
  /** ky in N/m, kr in N·m/rad; each optional as in the exchange format (at least one > 0). */
  | { readonly type: "spring"; readonly ky?: number; readonly kr?: number };

export type SupportType = Support["type"];
export const supportTypes: readonly SupportType[] = ["pinned", "fixed", "guided", "spring"];

export interface BeamNode {
  readonly id: NodeId;
  readonly x: number;
  readonly support: Support | null;
  readonly hinge: boolean;
}

/**
 * The shape and material a segment's stiffness was computed from. Editor-only: the exchange format
 * carries just E, I, A, G and shearFactor (its schema is strict), so a section chosen here is not
 * saved with the revision; typing E, I, A, G or κ by hand drops it, as it no longer applies.
 */
export interface SegmentSection {
  readonly shape: SectionShape;
  readonly material: Material;
}

/** Segment i joins nodes i and i+1; its id stays with it when nodes move. */
export interface Segment {
  readonly id: SegmentId;
  readonly E: number;
  readonly I: number;
  readonly A?: number;
  readonly G?: number;
  readonly shearFactor?: number;
  readonly section?: SegmentSection;
}

export type Load =
  | { readonly id: LoadId; readonly type: "point"; readonly x: number; readonly fy: number }
  | { readonly id: LoadId; readonly type: "moment"; readonly x: number; readonly mz: number }
  | {
      readonly id: LoadId;
      readonly type: "distributed";
      readonly x1: number;
      readonly x2: number;
      readonly qy1: number;
      readonly qy2: number;
    }
  /** References the node by id (the exchange format uses its index). uy in m. */
  | { readonly id: LoadId; readonly type: "settlement"; readonly node: NodeId; readonly uy: number };

export type LoadType = Load["type"];

export const loadCategories = [
  "dead",
  "live",
  "roof-live",
  "snow",
  "rain",
  "wind",
  "earthquake",
  "settlement",
  "other",
] as const;
export type LoadCategory = (typeof loadCategories)[number];

export interface LoadCase {
  readonly id: CaseId;
  /** The user's name for the case, e.g. "D"; it is the exchange format's `id`. */
  readonly name: string;
  readonly category: LoadCategory;
  readonly pattern: boolean;
  readonly loads: readonly Load[];
}

export interface CombinationFactor {
  readonly caseId: CaseId;
  readonly factor: number;
}

export interface Combination {
  readonly id: CombinationId;
  readonly name: string;
  readonly factors: readonly CombinationFactor[];
}

export interface BeamDocument {
  readonly title: string;
  readonly theory: Theory;
  readonly nodes: readonly BeamNode[];
  readonly segments: readonly Segment[];
  readonly loadCases: readonly LoadCase[];
  readonly combinations: readonly Combination[];
  readonly stations: readonly number[] | null;
  readonly units: UnitSystemId;
}

export type DocumentKey = keyof BeamDocument;

export function beamLength(doc: BeamDocument): number {
  const first = doc.nodes[0];
  const last = doc.nodes[doc.nodes.length - 1];
  return first && last ? last.x - first.x : 0;
}

export function findNode(doc: BeamDocument, id: NodeId): BeamNode | undefined {
  return doc.nodes.find((n) => n.id === id);
}

export function findCase(doc: BeamDocument, id: CaseId): LoadCase | undefined {
  return doc.loadCases.find((c) => c.id === id);
}

export function findLoad(doc: BeamDocument, id: LoadId): { load: Load; loadCase: LoadCase } | undefined {
  for (const loadCase of doc.loadCases) {
    const load = loadCase.loads.find((l) => l.id === id);
    if (load) return { load, loadCase };
  }
  return undefined;
}
