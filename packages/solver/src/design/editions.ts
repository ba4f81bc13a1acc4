/** Editions of the codes and standards the design functions cite. Shown on every check page. */
export const CODE_EDITIONS = [
  { id: "ASCE/SEI 7-22", title: "Minimum Design Loads and Associated Criteria for Buildings and Other Structures", usedFor: "load combinations (§2.3.1 strength, §2.4.1 allowable stress)" },
  { id: "AISC 360-22", title: "Specification for Structural Steel Buildings", usedFor: "I-shape flexure (Chapter F, §F1, §F2), shear (Chapter G, §G2.1), compactness (Table B4.1b)" },
  { id: "EN 1990:2002+A1", title: "Eurocode — Basis of structural design", usedFor: "load combinations (eq. 6.10, Table A1.1 ψ factors, Table A1.2(B) partial factors)" },
  { id: "IBC 2021", title: "International Building Code", usedFor: "deflection limits (Table 1604.3)" },
  { id: "ACI 318-19", title: "Building Code Requirements for Structural Concrete", usedFor: "concrete modulus of elasticity (§19.2.2.1)" },
] as const;

export type CodeEditionId = (typeof CODE_EDITIONS)[number]["id"];

/** The caution every check page and report carries. */
export const DESIGN_CAUTION =
  "These checks support, and do not replace, the judgement of a licensed engineer and the governing local building code. " +
  "Material values marked typical must be confirmed for the project. Live-load reduction is not applied. " +
  "Verify every factor and clause against the edition adopted by your jurisdiction.";
