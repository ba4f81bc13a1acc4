import type { HitTarget } from "../geometry/hitTest";
import type { EditorStore } from "../store/EditorStore";

// Tools are small state machines (one folder per tool, one file per state). The canvas turns
// pointer events into PointerInput; the active state decides what happens and which state is next.
// Tools change the document only through commands on the store.

export interface PointerInput {
  readonly type: "down" | "move" | "up" | "cancel";
  readonly px: number;
  readonly py: number;
  /** World x (m) under the pointer, not snapped. */
  readonly x: number;
  readonly target: HitTarget | null;
}

export interface ToolContext {
  readonly store: EditorStore;
  /** Snaps a world x to nodes and the grid. */
  snap(x: number): number;
}

/** Scratch data of the current state, e.g. where a drag began. */
export type StateData = Readonly<Record<string, unknown>>;

export type Transition = { readonly to: string; readonly data?: StateData } | void;

export interface ToolState {
  readonly id: string;
  onPointer(input: PointerInput, ctx: ToolContext, data: StateData): Transition;
}

export interface Tool {
  readonly id: string;
  readonly initial: string;
  readonly states: readonly ToolState[];
}

/** Pointer travel (px) before a press becomes a drag, so clicks never nudge anything. */
export const DRAG_THRESHOLD = 3;
