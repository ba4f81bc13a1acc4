import type { BeamDocument } from "./BeamDocument";
import { fromExchange, type ExchangeModel } from "./exchange";
import type { UnitSystemId } from "../units/unitSystems";

// Starting points for a new beam. Spans are round numbers in the chosen system (6 m or 20 ft), the
// section a mid-size steel beam (E = 200 GPa, I = 80e6 mm⁴) and gravity loads a plausible floor.

export type TemplateId = "simple-span" | "two-equal-spans" | "three-spans-overhang" | "cantilever";

export const templateLabels: Record<TemplateId, string> = {
  "simple-span": "Simple span",
  "two-equal-spans": "Two equal spans",
  "three-spans-overhang": "Three spans with overhang",
  cantilever: "Cantilever",
};

const FT = 0.3048;
const steel = { E: 2.0e11, I: 8.0e-5 };

function layout(template: TemplateId, span: number): ExchangeModel["nodes"] {
  const pin = { type: "pinned" as const };
  switch (template) {
    case "simple-span":
      return [{ x: 0, support: pin }, { x: span, support: pin }];
    case "two-equal-spans":
      return [{ x: 0, support: pin }, { x: span, support: pin }, { x: 2 * span, support: pin }];
    case "three-spans-overhang":
      return [
        { x: 0, support: pin },
        { x: span, support: pin },
        { x: 2 * span, support: pin },
        { x: 3 * span, support: pin },
        { x: 3 * span + span / 3 },
      ];
    case "cantilever":
      return [{ x: 0, support: { type: "fixed" } }, { x: span / 2 }];
  }
}

export function createTemplate(template: TemplateId, units: UnitSystemId): BeamDocument {
  const span = units === "us" ? 20 * FT : 6;
  const nodes = layout(template, span);
  const end = nodes[nodes.length - 1]!.x;
  const model: ExchangeModel = {
    format: "spanwright.beam/1",
    title: templateLabels[template],
    theory: "euler-bernoulli",
    nodes,
    segments: nodes.slice(1).map(() => ({ ...steel })),
    loadCases: [
      { id: "D", category: "dead", loads: [{ type: "distributed", x1: 0, x2: end, qy1: -5000, qy2: -5000 }] },
      { id: "L", category: "live", pattern: true, loads: [{ type: "distributed", x1: 0, x2: end, qy1: -8000, qy2: -8000 }] },
    ],
    combinations: [{ id: "1.2D+1.6L", factors: { D: 1.2, L: 1.6 } }],
  };
  const result = fromExchange(model, units);
  if (!result.ok) throw new Error(`template ${template} is invalid: ${result.error.message}`);
  return result.doc;
}
