import type { Analysis, SolverFailure } from "@spanwright/solver";

export interface SolveRequest {
  readonly seq: number;
  readonly model: unknown;
  /**
   * `model` is a saved revision's model as the API sends it (startEarly.ts, before the editor has
   * loaded): the worker first turns it into the model the editor will ask about (as the editor's
   * document reads it back, title left out), solves that, and names it in the answer's `model`.
   */
  readonly saved?: true;
}

/** "internal" marks an engine bug (a thrown programmer error), kept apart from the contract codes. */
export interface SolveFailure {
  readonly code: SolverFailure["code"] | "internal";
  readonly message: string;
  readonly where: string;
}

export type SolveResponse = (
  | { readonly seq: number; readonly ok: true; readonly analysis: Analysis }
  | { readonly seq: number; readonly ok: false; readonly error: SolveFailure }
) & {
  /** For a `saved` request: JSON of the model solved, to compare with the editor's own. */
  readonly model?: string;
};
