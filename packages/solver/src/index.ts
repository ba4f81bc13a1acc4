/**
 * @spanwright/solver: exact analysis of multi-span continuous beams (matrix stiffness method),
 * pure and synchronous, for the browser (Web Worker), the API and the command line alike.
 * Units are SI base units; y up, CCW positive, M sagging positive (see README.md).
 */
export { solve, buildSolveResult } from "./solve.js";
export type { SolveResult, CaseResult, EnvelopeResult, ReactionRow, NodeRow, StationRow, EnvelopeStationRow } from "./solve.js";
export { SolverError, type SolverErrorCode, type SolverFailure, type Result } from "./errors.js";
export {
  beamModelSchema,
  supportSchema,
  nodeSchema,
  segmentSchema,
  loadSchema,
  loadCaseSchema,
  combinationSchema,
  loadCategorySchema,
} from "./beamModelSchema.js";
export type { BeamModel, BeamModelInput, BeamNode, Segment, Support, SupportType, Load, LoadCase, LoadCategory, Combination, Theory } from "./beamModelSchema.js";
export { validateModel } from "./validateModel.js";
export { analyze, analyzeModel, tryAnalyze } from "./analyze.js";
export type { Analysis, AnalysisCase, AnalysisCombination, AnalysisNode, Curve } from "./analysisTypes.js";
export type { Span } from "./loadGrid.js";
export { valuesAt, diagram, extremes, locateInterval } from "./fieldQueries.js";
export type { Quantity, Side, FieldValues, Extreme, Extremes, Diagram } from "./fieldQueries.js";
export { envelopeAt, envelopeDiagram, reactionEnvelope } from "./envelopeQueries.js";
export { envelopeExtremes } from "./envelopeExtremes.js";
export type { EnvelopeQuantity, EnvelopeValues, EnvelopeDiagram, ReactionEnvelope } from "./envelopeQueries.js";
