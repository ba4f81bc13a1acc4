/**
 * Closed forms for solid and hollow circles about a diameter (any handbook, e.g. Roark's
 * Formulas for Stress and Strain, Table A.1). `s` is depth below the top fibre, m.
 */

/** Area of a circular segment of radius r cut by a chord at distance y from the centre, above it. */
function segmentArea(r: number, y: number): number {
  if (y >= r) return 0;
  if (y <= -r) return Math.PI * r * r;
  return r * r * Math.acos(y / r) - y * Math.sqrt(r * r - y * y);
}

/** First moment about the diameter of the part of a solid circle above height y (from centre): (2/3)(r² − y²)^{3/2}. */
function segmentFirstMoment(r: number, y: number): number {
  if (Math.abs(y) >= r) return 0;
  return (2 / 3) * (r * r - y * y) ** 1.5;
}

function chordWidth(r: number, y: number): number {
  return Math.abs(y) >= r ? 0 : 2 * Math.sqrt(r * r - y * y);
}

export interface RoundGeometry {
  readonly ro: number;
  /** Inner radius; 0 for a solid circle. */
  readonly ri: number;
}

export function roundArea({ ro, ri }: RoundGeometry): number {
  return Math.PI * (ro * ro - ri * ri);
}

/** I = π(D⁴ − Di⁴)/64. */
export function roundSecondMoment({ ro, ri }: RoundGeometry): number {
  return (Math.PI * (ro ** 4 - ri ** 4)) / 4;
}

/** Z = (D³ − Di³)/6. */
export function roundPlasticModulus({ ro, ri }: RoundGeometry): number {
  return (4 / 3) * (ro ** 3 - ri ** 3);
}

/** First moment about the centroid axis of the material above depth s (from the top fibre). */
export function roundFirstMomentAbove(g: RoundGeometry, s: number): number {
  const y = g.ro - s;
  return segmentFirstMoment(g.ro, y) - (g.ri > 0 ? segmentFirstMoment(g.ri, y) : 0);
}

/** Width of material at depth s below the top fibre. */
export function roundWidthAt(g: RoundGeometry, s: number): number {
  const y = g.ro - s;
  return chordWidth(g.ro, y) - (g.ri > 0 ? chordWidth(g.ri, y) : 0);
}

/** Area above depth s; used by tests to confirm the plastic axis sits at the centre. */
export function roundAreaAbove(g: RoundGeometry, s: number): number {
  const y = g.ro - s;
  return segmentArea(g.ro, y) - (g.ri > 0 ? segmentArea(g.ri, y) : 0);
}
