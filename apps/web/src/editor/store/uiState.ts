import type { Camera } from "../geometry/camera";
import { defaultCamera } from "../geometry/camera";
import type { SupportType, LoadType } from "../model/BeamDocument";
import type { CaseId, CombinationId, LoadId, NodeId, SegmentId } from "../model/ids";

// UI state: what the user is looking at and doing. Never saved, never undone, never solved.

export type Selection =
  | { readonly kind: "node"; readonly id: NodeId }
  | { readonly kind: "segment"; readonly id: SegmentId }
  | { readonly kind: "load"; readonly id: LoadId }
  | { readonly kind: "case"; readonly id: CaseId }
  | { readonly kind: "combination"; readonly id: CombinationId };

export type ToolId = "select" | "pan" | "place-support" | "place-hinge" | "place-load" | "split";

export interface ToolOptions {
  readonly supportType: SupportType;
  readonly loadType: Exclude<LoadType, "settlement">;
}

/** Which results the diagrams show: one case, one combination, or an envelope ("*" = all). */
export type ResultTarget =
  | { readonly kind: "case"; readonly id: CaseId }
  | { readonly kind: "combination"; readonly id: CombinationId }
  | { readonly kind: "envelope"; readonly id: CombinationId | "*" };

export interface Notice {
  readonly tone: "info" | "error";
  readonly text: string;
}

export interface UiState {
  readonly selection: Selection | null;
  readonly camera: Camera;
  readonly viewportWidth: number;
  readonly tool: ToolId;
  readonly toolOptions: ToolOptions;
  /** Case that new loads go into, and whose loads the canvas edits. */
  readonly activeCaseId: CaseId | null;
  /** null shows every case. */
  readonly visibleCases: ReadonlySet<CaseId> | null;
  readonly gridStep: number; // m
  readonly resultTarget: ResultTarget | null;
  /** World x (m) under the pointer, for the diagram cursor; null when outside. */
  readonly hoverX: number | null;
  /** World x (m) picked on the diagrams (or typed) for the section view; null until chosen. */
  readonly sectionX: number | null;
  readonly notice: Notice | null;
  /** A load being drawn by the place-load tool, shown on the interactive layer. */
  readonly preview: { readonly x1: number; readonly x2: number } | null;
  /** Whether the user's role may change the beam (viewers and checkers may not): every editing action checks it. */
  readonly canEdit: boolean;
}

export function createUiState(activeCaseId: CaseId | null, gridStep: number, canEdit = true): UiState {
  return {
    selection: null,
    camera: defaultCamera,
    viewportWidth: 900,
    tool: "select",
    toolOptions: { supportType: "pinned", loadType: "point" },
    activeCaseId,
    visibleCases: null,
    gridStep,
    resultTarget: null,
    hoverX: null,
    sectionX: null,
    notice: null,
    preview: null,
    canEdit,
  };
}

export function sameSelection(a: Selection | null, b: Selection | null): boolean {
  return a?.kind === b?.kind && a?.id === b?.id;
}
