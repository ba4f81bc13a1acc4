import type { IShape } from "./sectionShape.js";

/**
 * Properties of a doubly symmetric I-shape needed by AISC 360-22 Chapter F, from its plates
 * (root fillets ignored). SI units. Tabulated values (AISC Manual Table 1-1) may be used instead.
 */
export interface IShapeLtbProperties {
  /** Elastic section modulus about the strong axis, m³. */
  readonly Sx: number;
  /** Plastic section modulus about the strong axis, m³. */
  readonly Zx: number;
  /** Minor-axis second moment, m⁴: 2·tf·bf³/12 + (d − 2tf)·tw³/12. */
  readonly Iy: number;
  /** Minor-axis radius of gyration √(Iy/A), m. */
  readonly ry: number;
  /** Distance between flange centroids d − tf, m. */
  readonly ho: number;
  /** St. Venant torsion constant (2·bf·tf³ + ho·tw³)/3, m⁴ (thin-walled open section). */
  readonly J: number;
  /** Warping constant Iy·ho²/4, m⁶ (AISC 360-22 §F2 user note, doubly symmetric I). */
  readonly Cw: number;
  /** Effective radius of gyration, rts² = √(Iy·Cw)/Sx (AISC 360-22 eq. F2-7), m. */
  readonly rts: number;
  /** Clear web height between flanges d − 2tf, m (fillets ignored, so slightly conservative for h/tw). */
  readonly h: number;
  readonly bf: number;
  readonly tf: number;
  readonly tw: number;
  readonly d: number;
}

export function iShapeLtbProperties(shape: IShape): IShapeLtbProperties {
  const { d, bf, tf, tw } = shape;
  const h = d - 2 * tf;
  const A = 2 * bf * tf + h * tw;
  const Ix = (bf * d ** 3 - (bf - tw) * h ** 3) / 12;
  const Sx = Ix / (d / 2);
  const Zx = bf * tf * (d - tf) + (tw * h * h) / 4;
  const Iy = (2 * tf * bf ** 3) / 12 + (h * tw ** 3) / 12;
  const ho = d - tf;
  const J = (2 * bf * tf ** 3 + ho * tw ** 3) / 3;
  const Cw = (Iy * ho * ho) / 4;
  const rts = Math.sqrt(Math.sqrt(Iy * Cw) / Sx);
  return { Sx, Zx, Iy, ry: Math.sqrt(Iy / A), ho, J, Cw, rts, h, bf, tf, tw, d };
}
