/**
 * Modulus of elasticity of concrete, ACI 318-19 §19.2.2.1, converted to SI.
 * (a) Ec = wc^1.5 · 0.043 · √f'c  (MPa; wc in kg/m³ between 1440 and 2560)
 * (b) Ec = 4700 · √f'c            (MPa, normal-weight concrete)
 * Inputs and outputs here are Pa and kg/m³.
 */
const MPA = 1e6;

export function concreteModulusNormalWeight(fc: number): number {
  return 4700 * Math.sqrt(fc / MPA) * MPA;
}

export function concreteModulusFromDensity(fc: number, wc: number): number {
  return wc ** 1.5 * 0.043 * Math.sqrt(fc / MPA) * MPA;
}

/** Density range over which §19.2.2.1(a) applies, kg/m³. */
export const ACI_DENSITY_RANGE = { min: 1440, max: 2560 } as const;
