import type { Analysis, SolverFailure } from "@spanwright/solver";

export interface SolveRequest {
  readonly seq: number;
  readonly model: unknown;
}

/** "internal" marks an engine bug (a thrown programmer error), kept apart from the contract codes. */
export interface SolveFailure {
  readonly code: SolverFailure["code"] | "internal";
  readonly message: string;
  readonly where: string;
}

export type SolveResponse =
  | { readonly seq: number; readonly ok: true; readonly analysis: Analysis }
  | { readonly seq: number; readonly ok: false; readonly error: SolveFailure };
