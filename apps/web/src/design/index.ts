// Design components the beam editor can mount. Values in and out are SI (exchange format); only
// `units` chooses how they are shown. None of these imports the engine: pass `solve` where asked.
export { SectionEditor, type SectionEditorProps, type SectionChange } from "./SectionEditor";
export { SectionPropertiesTable } from "./SectionPropertiesTable";
export { MaterialPicker, type MaterialPickerProps } from "./MaterialPicker";
export { CombinationGenerator, type CombinationGeneratorProps } from "./CombinationGenerator";
export { ChecksPanel, type ChecksPanelProps } from "./ChecksPanel";
export { CheckTable } from "./CheckTable";
export { DesignCaution } from "./DesignCaution";
export { SectionView, type SectionViewProps } from "./SectionView";
export { TheoryPanel, type TheoryPanelProps } from "./TheoryPanel";
export { computeBeamChecks, stationsForChecks, type BeamCheckRequest, type BeamCheckOutcome } from "./computeBeamChecks";
export { designSpans, type DesignModel, type DesignSpan } from "./designModel";
