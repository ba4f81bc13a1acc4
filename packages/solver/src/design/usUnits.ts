/**
 * Exact conversion factors from US customary units to the SI units used inside the design
 * functions. Only for edges (display, tests against US tables); never mixed into formulas.
 */
export const INCH = 0.0254; // m, exact by definition
export const FOOT = 0.3048; // m
export const POUND_FORCE = 4.4482216152605; // N
export const KIP = 1000 * POUND_FORCE; // N
export const KSI = KIP / (INCH * INCH); // Pa, ≈ 6.894757e6
export const PSI = POUND_FORCE / (INCH * INCH); // Pa
export const KIP_FOOT = KIP * FOOT; // N·m
export const KIP_INCH = KIP * INCH; // N·m
