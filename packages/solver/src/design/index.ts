/**
 * @spanwright/solver/design — pure engineering-design functions: sections, materials, load
 * combinations, member checks, the section stress profile and the shear-deformation share.
 * SI units throughout (m, m², m³, m⁴, Pa, N, N·m). Nothing here imports the beam engine.
 */
export * from "./editions.js";
export * from "./result.js";
export * from "./usUnits.js";
export * from "./sections/index.js";
export * from "./materials/index.js";
export * from "./combinations/index.js";
export * from "./checks/index.js";
export * from "./profile/sectionProfile.js";
export * from "./shear/shearShare.js";
export * from "./segmentProperties.js";
