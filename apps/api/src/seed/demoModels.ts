/**
 * Demo beams for the invented Millrace Library (a riverside public library by the invented firm
 * Kestrel Lane Engineers). Exchange format, SI base units: N, m, Pa, m⁴; gravity loads negative.
 * Sections are plausible, not taken from any catalogue: demo data only.
 */

/** Steel: E = 200 GPa, G = 77 GPa (common practice values). */
const steel = { E: 2.0e11, G: 7.7e10 };
/** Cracked-section concrete, roughly: E = 30 GPa (common practice order of magnitude). */
const concreteE = 3.0e10;

/** Roof beam over the reading room: three spans and an overhang towards the river terrace. */
export function readingRoomRoofBeam(liveLoad = -6_000): Record<string, unknown> {
  const I = 2.5e-4;
  return {
    format: "spanwright.beam/1",
    title: "RB-2 reading room roof, grid C",
    theory: "euler-bernoulli",
    nodes: [
      { x: 0, support: { type: "pinned" } },
      { x: 6.0, support: { type: "pinned" } },
      { x: 13.0, support: { type: "pinned" } },
      { x: 19.0, support: { type: "pinned" } },
      { x: 21.5 },
    ],
    segments: [
      { E: steel.E, I },
      { E: steel.E, I },
      { E: steel.E, I },
      { E: steel.E, I },
    ],
    loadCases: [
      {
        id: "D",
        category: "dead",
        loads: [
          { type: "distributed", x1: 0, x2: 21.5, qy1: -8_000, qy2: -8_000 },
          { type: "point", x: 21.5, fy: -15_000 },
        ],
      },
      {
        id: "L",
        category: "roof-live",
        pattern: true,
        loads: [{ type: "distributed", x1: 0, x2: 21.5, qy1: liveLoad, qy2: liveLoad }],
      },
    ],
    combinations: [
      { id: "C1", factors: { D: 1.2, L: 1.6 } },
      { id: "C2", factors: { D: 1.4 } },
    ],
    stations: [3.0, 9.5, 16.0, 20.25],
  };
}

/** Grade beam along the river wall on four piles, modelled as vertical springs. */
export function riverWallGradeBeam(): Record<string, unknown> {
  const pile = { type: "spring", ky: 8.0e7 };
  // 400 x 800 mm rectangle: I = b h³ / 12
  const I = (0.4 * 0.8 ** 3) / 12;
  return {
    format: "spanwright.beam/1",
    title: "GB-4 river wall grade beam",
    nodes: [
      { x: 0, support: pile },
      { x: 5.0, support: pile },
      { x: 10.0, support: pile },
      { x: 15.0, support: pile },
    ],
    segments: [
      { E: concreteE, I },
      { E: concreteE, I },
      { E: concreteE, I },
    ],
    loadCases: [
      { id: "D", category: "dead", loads: [{ type: "distributed", x1: 0, x2: 15, qy1: -25_000, qy2: -25_000 }] },
      {
        id: "L",
        category: "live",
        pattern: true,
        loads: [{ type: "distributed", x1: 0, x2: 15, qy1: -10_000, qy2: -10_000 }],
      },
    ],
    combinations: [{ id: "C1", factors: { D: 1.2, L: 1.6 } }],
  };
}

/** Mezzanine beam: fixed into the core wall, a cantilever past the first column, a drop-in span on a hinge. */
export function mezzanineBeam(): Record<string, unknown> {
  const I = 1.2e-4;
  return {
    format: "spanwright.beam/1",
    title: "MB-1 stacks mezzanine",
    theory: "timoshenko",
    nodes: [
      { x: 0, support: { type: "fixed" } },
      { x: 4.0, support: { type: "pinned" } },
      { x: 5.5, hinge: true },
      { x: 9.0, support: { type: "pinned" } },
    ],
    segments: [0, 1, 2].map(() => ({ E: steel.E, I, A: 6.0e-3, G: steel.G, shearFactor: 0.4 })),
    loadCases: [
      {
        id: "D",
        category: "dead",
        loads: [
          { type: "distributed", x1: 0, x2: 9, qy1: -4_500, qy2: -4_500 },
          { type: "point", x: 7.0, fy: -9_000 },
        ],
      },
      {
        id: "L",
        category: "live",
        pattern: true,
        loads: [{ type: "distributed", x1: 0, x2: 9, qy1: -7_500, qy2: -7_500 }],
      },
    ],
    combinations: [{ id: "C1", factors: { D: 1.2, L: 1.6 } }],
  };
}
