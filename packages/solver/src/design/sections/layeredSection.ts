/**
 * Properties of a section described as horizontal bands, each of constant total width. Exact for
 * sections made of rectangles (rectangle, box, I, channel, tee) bent about a horizontal axis.
 * Depth coordinate `s` is measured downward from the top fibre, in metres.
 */
export interface Band {
  readonly top: number;
  readonly bottom: number;
  /** Total width of material at this depth (e.g. both webs of a box), m. */
  readonly width: number;
}

export interface BandProperties {
  readonly A: number;
  /** Centroid below the top fibre, m. */
  readonly yTop: number;
  /** Second moment of area about the centroidal horizontal axis, m⁴. */
  readonly I: number;
  /** Plastic neutral axis (equal areas above and below) below the top fibre, m. */
  readonly yPlastic: number;
  /** Plastic section modulus, m³. */
  readonly Z: number;
}

export function bandArea(bands: readonly Band[]): number {
  return bands.reduce((sum, b) => sum + b.width * (b.bottom - b.top), 0);
}

/** First moment, about the horizontal axis at depth `axis`, of the area above depth `cut`. */
export function firstMomentAbove(bands: readonly Band[], cut: number, axis: number): number {
  let q = 0;
  for (const b of bands) {
    const lo = b.top;
    const hi = Math.min(b.bottom, cut);
    if (hi > lo) q += b.width * (hi - lo) * (axis - (lo + hi) / 2);
  }
  return q;
}

/** Width at depth `s`; at a band boundary the smaller of the two widths (the critical shear plane). */
export function widthAt(bands: readonly Band[], s: number): number {
  let w = Number.POSITIVE_INFINITY;
  for (const b of bands) if (s >= b.top && s <= b.bottom) w = Math.min(w, b.width);
  return Number.isFinite(w) ? w : 0;
}

function plasticAxis(bands: readonly Band[], halfArea: number): number {
  let acc = 0;
  for (const b of bands) {
    const area = b.width * (b.bottom - b.top);
    if (acc + area >= halfArea) return b.top + (halfArea - acc) / b.width;
    acc += area;
  }
  return bands[bands.length - 1]?.bottom ?? 0;
}

/** Bands must be sorted top to bottom and must not overlap. */
export function bandProperties(bands: readonly Band[]): BandProperties {
  const A = bandArea(bands);
  const momentAboutTop = bands.reduce((s, b) => s + b.width * (b.bottom - b.top) * ((b.top + b.bottom) / 2), 0);
  const yTop = momentAboutTop / A;
  const I = bands.reduce((s, b) => {
    const h = b.bottom - b.top;
    const arm = (b.top + b.bottom) / 2 - yTop;
    return s + (b.width * h ** 3) / 12 + b.width * h * arm * arm;
  }, 0);
  const yPlastic = plasticAxis(bands, A / 2);
  const depth = bands[bands.length - 1]?.bottom ?? 0;
  // Z = first moment of the area above the PNA plus that below, both taken about the PNA.
  const above = firstMomentAbove(bands, yPlastic, yPlastic);
  const below = firstMomentAbove(bands, depth, yPlastic) - above;
  return { A, yTop, I, yPlastic, Z: above - below };
}
