import type { BeamDocument, Load, LoadCategory, Support, Theory } from "./BeamDocument";
import { createCaseId, createCombinationId, createLoadId, createNodeId, createSegmentId, type CaseId } from "./ids";
import type { UnitSystemId } from "../units/unitSystems";
import { exhaustive } from "../commands/loadGeometry";

// The exchange format's beam model (shared/contract/exchange-format.md), SI throughout. Declared
// here as well as in the engine so the editor compiles and converts without loading the engine
// chunk; the engine's schema validates imports.

export type ExchangeLoad =
  | { type: "point"; x: number; fy: number }
  | { type: "moment"; x: number; mz: number }
  | { type: "distributed"; x1: number; x2: number; qy1: number; qy2: number }
  | { type: "settlement"; node: number; uy: number };

export interface ExchangeModel {
  format: "spanwright.beam/1";
  title?: string;
  theory?: Theory;
  nodes: { x: number; support?: Support; hinge?: boolean }[];
  segments: { E: number; I: number; A?: number; G?: number; shearFactor?: number }[];
  loadCases: { id: string; category: LoadCategory; pattern?: boolean; loads: ExchangeLoad[] }[];
  combinations?: { id: string; factors: Record<string, number> }[];
  stations?: number[];
}

export const EXCHANGE_FORMAT = "spanwright.beam/1";

/** The document as the engine and files see it. Defaults are left out (no `hinge: false`). */
export function toExchange(doc: BeamDocument): ExchangeModel {
  const nodeIndex = new Map(doc.nodes.map((n, i) => [n.id, i]));
  const caseName = new Map(doc.loadCases.map((c) => [c.id, c.name]));
  const model: ExchangeModel = {
    format: EXCHANGE_FORMAT,
    ...(doc.title ? { title: doc.title } : {}),
    theory: doc.theory,
    nodes: doc.nodes.map((n) => ({
      x: n.x,
      ...(n.support ? { support: { ...n.support } } : {}),
      ...(n.hinge ? { hinge: true } : {}),
    })),
    // Only the stiffness crosses into the contract; the editor-only `section` stays behind.
    segments: doc.segments.map(({ E, I, A, G, shearFactor }) => ({
      E,
      I,
      ...(A !== undefined ? { A } : {}),
      ...(G !== undefined ? { G } : {}),
      ...(shearFactor !== undefined ? { shearFactor } : {}),
    })),
    loadCases: doc.loadCases.map((c) => ({
      id: c.name,
      category: c.category,
      ...(c.pattern ? { pattern: true } : {}),
      loads: c.loads.map((l) => loadToExchange(l, nodeIndex)),
    })),
    combinations: doc.combinations.map((k) => ({
      id: k.name,
      factors: Object.fromEntries(k.factors.map((f) => [caseName.get(f.caseId) ?? String(f.caseId), f.factor])),
    })),
  };
  if (doc.stations) model.stations = [...doc.stations];
  return model;
}

function loadToExchange(l: Load, nodeIndex: Map<string, number>): ExchangeLoad {
  switch (l.type) {
    case "point":
      return { type: "point", x: l.x, fy: l.fy };
    case "moment":
      return { type: "moment", x: l.x, mz: l.mz };
    case "distributed":
      return { type: "distributed", x1: l.x1, x2: l.x2, qy1: l.qy1, qy2: l.qy2 };
    case "settlement":
      return { type: "settlement", node: nodeIndex.get(l.node) ?? -1, uy: l.uy };
    default:
      return exhaustive(l);
  }
}

export type FromExchangeResult =
  | { readonly ok: true; readonly doc: BeamDocument }
  | { readonly ok: false; readonly error: { readonly code: "invalid-model"; readonly message: string; readonly where: string } };

function invalid(where: string, message: string): FromExchangeResult {
  return { ok: false, error: { code: "invalid-model", message, where } };
}

/**
 * A document from an exchange model, with fresh ids. Checks what the document's structure needs
 * (segment count, settlement nodes, factor names); the engine's schema judges the rest.
 */
export function fromExchange(model: ExchangeModel, units: UnitSystemId = "si"): FromExchangeResult {
  if (model.format !== EXCHANGE_FORMAT) return invalid("format", `Expected format ${EXCHANGE_FORMAT}.`);
  if (!Array.isArray(model.nodes) || model.nodes.length < 2) return invalid("nodes", "A beam needs at least two nodes.");
  if (!Array.isArray(model.segments) || model.segments.length !== model.nodes.length - 1) {
    return invalid("segments", "There must be one segment fewer than nodes.");
  }
  const nodes = model.nodes.map((n) => ({
    id: createNodeId(),
    x: n.x,
    support: n.support ? { ...n.support } : null,
    hinge: n.hinge === true,
  }));
  const caseIds = new Map<string, CaseId>();
  const loadCases = [];
  for (const [ci, c] of (model.loadCases ?? []).entries()) {
    const id = createCaseId();
    caseIds.set(c.id, id);
    const loads: Load[] = [];
    for (const [li, l] of c.loads.entries()) {
      if (l.type === "settlement") {
        const node = nodes[l.node];
        if (!node) return invalid(`loadCases[${ci}].loads[${li}].node`, "Settlement refers to a missing node.");
        loads.push({ id: createLoadId(), type: "settlement", node: node.id, uy: l.uy });
      } else loads.push({ ...l, id: createLoadId() });
    }
    loadCases.push({ id, name: c.id, category: c.category, pattern: c.pattern === true, loads });
  }
  const combinations = [];
  for (const [ki, k] of (model.combinations ?? []).entries()) {
    const factors = [];
    for (const [name, factor] of Object.entries(k.factors)) {
      const caseId = caseIds.get(name);
      if (!caseId) return invalid(`combinations[${ki}].factors.${name}`, `No load case named “${name}”.`);
      factors.push({ caseId, factor });
    }
    combinations.push({ id: createCombinationId(), name: k.id, factors });
  }
  return {
    ok: true,
    doc: {
      title: model.title ?? "",
      theory: model.theory ?? "euler-bernoulli",
      nodes,
      segments: model.segments.map((s) => ({ ...s, id: createSegmentId() })),
      loadCases,
      combinations,
      stations: model.stations ? [...model.stations] : null,
      units,
    },
  };
}
