/**
 * Starting models for a new beam, in the exchange format (SI base units: m, N, Pa, m⁴; gravity
 * loads negative). Placeholder section values for a demo steel beam; the engineer edits them.
 */

export type BeamTemplateId = "simple-span" | "two-spans";

export interface BeamTemplate {
  id: BeamTemplateId;
  label: string;
  model: Record<string, unknown>;
}

// E = 200 GPa is the usual modulus for structural steel (common practice); I is a placeholder.
const steel = { E: 2.0e11, I: 8.0e-5 };
// A 5 kN/m dead load so a new beam shows diagrams at once; invented, for a starting point only.
const deadUniform = (length: number) => ({
  id: "D",
  category: "dead",
  loads: [{ type: "distributed", x1: 0, x2: length, qy1: -5000, qy2: -5000 }],
});

export const beamTemplates: readonly BeamTemplate[] = [
  {
    id: "simple-span",
    label: "Simple span, 6 m",
    model: {
      format: "spanwright.beam/1",
      theory: "euler-bernoulli",
      nodes: [
        { x: 0, support: { type: "pinned" } },
        { x: 6, support: { type: "pinned" } },
      ],
      segments: [steel],
      loadCases: [deadUniform(6)],
      combinations: [],
    },
  },
  {
    id: "two-spans",
    label: "Two equal spans, 2 × 6 m",
    model: {
      format: "spanwright.beam/1",
      theory: "euler-bernoulli",
      nodes: [
        { x: 0, support: { type: "pinned" } },
        { x: 6, support: { type: "pinned" } },
        { x: 12, support: { type: "pinned" } },
      ],
      segments: [steel, steel],
      loadCases: [deadUniform(12)],
      combinations: [],
    },
  },
];

export function findBeamTemplate(id: string): BeamTemplate {
  return beamTemplates.find((t) => t.id === id) ?? (beamTemplates[0] as BeamTemplate);
}
