export * from "./sectionShape.js";
export * from "./sectionProperties.js";
export * from "./validateSectionShape.js";
export * from "./iShapeProperties.js";
export { sectionGeometry, shapeDepth, type SectionGeometry } from "./sectionGeometry.js";
export type { Band, BandProperties } from "./layeredSection.js";
