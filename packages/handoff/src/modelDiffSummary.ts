import type { BeamLoad, BeamSegment, SupportSpec } from "./exchange.js";
import type { ModelChange, ModelDiff } from "./modelDiff.js";
import { formatShort, type UnitSystem } from "./units.js";

/**
 * One short line per change, in the project's units, e.g. "L: -3 kN/m -> -5 kN/m on span 2",
 * "support at x = 12 m became a spring". Signs are the contract's: gravity loads are negative.
 */

function spansText(spans: number[]): string {
  if (spans.length === 0) return "";
  if (spans.length === 1) return `span ${spans[0]}`;
  const sorted = [...spans].sort((a, b) => a - b);
  const contiguous = sorted.every((s, i) => i === 0 || s === sorted[i - 1]! + 1);
  return contiguous ? `spans ${sorted[0]}-${sorted[sorted.length - 1]}` : `spans ${sorted.join(", ")}`;
}

function supportText(support: SupportSpec, u: UnitSystem): string {
  switch (support.type) {
    case "pinned":
    case "fixed":
    case "guided":
      return support.type;
    case "spring": {
      const parts = [
        support.ky !== undefined ? `ky ${formatShort(u, "springTranslation", support.ky)}` : "",
        support.kr !== undefined ? `kr ${formatShort(u, "springRotation", support.kr)}` : "",
      ].filter(Boolean);
      return `spring (${parts.join(", ")})`;
    }
    default: {
      const never: never = support;
      return never;
    }
  }
}

function magnitudeText(load: BeamLoad, u: UnitSystem): string {
  switch (load.type) {
    case "point":
      return formatShort(u, "force", load.fy);
    case "moment":
      return formatShort(u, "moment", load.mz);
    case "distributed":
      return load.qy1 === load.qy2
        ? formatShort(u, "distributed", load.qy1)
        : `${formatShort(u, "distributed", load.qy1).split(" ")[0]}..${formatShort(u, "distributed", load.qy2)}`;
    case "settlement":
      return `settlement ${formatShort(u, "deflection", load.uy)}`;
    default: {
      const never: never = load;
      return never;
    }
  }
}

function placeText(load: BeamLoad, spans: number[], u: UnitSystem): string {
  const where = spansText(spans);
  switch (load.type) {
    case "point":
    case "moment":
      return `at x = ${formatShort(u, "length", load.x)}${where ? ` (${where})` : ""}`;
    case "distributed":
      return `on ${where} (x = ${formatShort(u, "length", load.x1).split(" ")[0]}..${formatShort(u, "length", load.x2)})`;
    case "settlement":
      return `at node ${load.node}${where ? ` (${where})` : ""}`;
    default: {
      const never: never = load;
      return never;
    }
  }
}

function sectionText(before: BeamSegment, after: BeamSegment, u: UnitSystem): string {
  const parts: string[] = [];
  if (before.E !== after.E) parts.push(`E ${formatShort(u, "modulus", before.E)} -> ${formatShort(u, "modulus", after.E)}`);
  if (before.I !== after.I) parts.push(`I ${formatShort(u, "inertia", before.I)} -> ${formatShort(u, "inertia", after.I)}`);
  return parts.length > 0 ? parts.join(", ") : "shear properties changed";
}

function factorsText(before: Record<string, number>, after: Record<string, number>): string {
  const keys = [...new Set([...Object.keys(before), ...Object.keys(after)])];
  return keys
    .filter((k) => before[k] !== after[k])
    .map((k) => (before[k] === undefined ? `${k} added ×${after[k]}` : after[k] === undefined ? `${k} removed` : `${k} ${before[k]} -> ${after[k]}`))
    .join(", ");
}

function factorList(factors: Record<string, number>): string {
  return Object.entries(factors).map(([k, f]) => `${f} ${k}`).join(" + ");
}

export function describeChange(change: ModelChange, u: UnitSystem): string {
  const len = (x: number) => formatShort(u, "length", x);
  switch (change.kind) {
    case "theory":
      return `beam theory ${change.before} -> ${change.after}`;
    case "span-count":
      return `number of spans ${change.before} -> ${change.after}`;
    case "span-length":
      return `span ${change.span} length ${len(change.before)} -> ${len(change.after)}`;
    case "node-added":
      return `node added at x = ${len(change.x)}${change.hinge ? " with a hinge" : ""}`;
    case "node-removed":
      return `node at x = ${len(change.x)} removed`;
    case "node-moved":
      return `node at x = ${len(change.before)} moved to x = ${len(change.after)}`;
    case "support-added":
      return `${supportText(change.support, u)} support added at x = ${len(change.x)}`;
    case "support-removed":
      return `support at x = ${len(change.x)} removed`;
    case "support-changed":
      return change.before.type === change.after.type
        ? `support at x = ${len(change.x)}: ${supportText(change.before, u)} -> ${supportText(change.after, u)}`
        : `support at x = ${len(change.x)} became ${change.after.type === "spring" ? "a spring" : change.after.type}`;
    case "hinge-added":
      return `hinge added at x = ${len(change.x)}`;
    case "hinge-removed":
      return `hinge at x = ${len(change.x)} removed`;
    case "section-changed":
      return `section x = ${len(change.x1).split(" ")[0]}..${len(change.x2)}: ${sectionText(change.before, change.after, u)}`;
    case "case-added":
      return `load case ${change.caseId} added (${change.category})`;
    case "case-removed":
      return `load case ${change.caseId} removed`;
    case "case-category":
      return `load case ${change.caseId} category ${change.before} -> ${change.after}`;
    case "case-pattern":
      return `load case ${change.caseId} pattern loading ${change.after ? "on" : "off"}`;
    case "load-added":
      return `${change.caseId}: added ${magnitudeText(change.load, u)} ${placeText(change.load, change.spans, u)}`;
    case "load-removed":
      return `${change.caseId}: removed ${magnitudeText(change.load, u)} ${placeText(change.load, change.spans, u)}`;
    case "load-changed":
      return `${change.caseId}: ${magnitudeText(change.before, u)} -> ${magnitudeText(change.after, u)} ${placeText(change.after, change.spans, u)}`;
    case "combination-added":
      return `combination ${change.id} added (${factorList(change.factors)})`;
    case "combination-removed":
      return `combination ${change.id} removed`;
    case "combination-changed":
      return `combination ${change.id} factors changed (${factorsText(change.before, change.after)})`;
    default: {
      const never: never = change;
      return never;
    }
  }
}

/** The change summary of a revision: one line per change, in order. */
export function summariseModelDiff(diff: ModelDiff, units: UnitSystem): string[] {
  return diff.changes.map((c) => describeChange(c, units));
}
