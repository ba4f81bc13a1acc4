export * from "./exchange.js";
export * from "./units.js";
export * from "./reactionTable.js";
export * from "./csv.js";
export * from "./loadSchedule.js";
export * from "./spans.js";
export * from "./modelDiff.js";
export * from "./modelDiffSummary.js";
export * from "./compare.js";
export { CAUTION, diagramStations, renderCalculationReport, type CalculationReportInput } from "./pdfReport.js";
export type { ReportCheckRow, ReportCodeEdition } from "./pdfSections.js";
export {
  sendHandoffMail,
  handoffSubject,
  handoffText,
  HandoffMailError,
  type HandoffMail,
  type HandoffAttachment,
  type HandoffMailErrorCode,
  type SentHandoff,
  type SmtpOptions,
} from "./mail.js";
