import type { BeamDocument, Load, LoadCase } from "../model/BeamDocument";
import { findLoad } from "../model/BeamDocument";
import type { CaseId, LoadId } from "../model/ids";
import { changed, isFiniteNumber, refused, type CommandResult } from "./DocChange";
import { exhaustive } from "./loadGeometry";

function beamRange(doc: BeamDocument): [number, number] {
  return [doc.nodes[0]?.x ?? 0, doc.nodes[doc.nodes.length - 1]?.x ?? 0];
}

/** Checks a load against the contract: finite values, x within the beam, x1 < x2, a known node. */
export function checkLoad(doc: BeamDocument, load: Load): string | null {
  const [x0, x1] = beamRange(doc);
  const inside = (x: number) => isFiniteNumber(x) && x >= x0 - 1e-9 && x <= x1 + 1e-9;
  switch (load.type) {
    case "point":
      return !inside(load.x) ? "The load must lie on the beam." : !isFiniteNumber(load.fy) ? "Enter a force." : null;
    case "moment":
      return !inside(load.x) ? "The moment must lie on the beam." : !isFiniteNumber(load.mz) ? "Enter a moment." : null;
    case "distributed":
      if (!inside(load.x1) || !inside(load.x2)) return "The load must lie on the beam.";
      if (!(load.x1 < load.x2)) return "The load must end right of where it starts.";
      return isFiniteNumber(load.qy1) && isFiniteNumber(load.qy2) ? null : "Enter the intensities.";
    case "settlement":
      if (!doc.nodes.some((n) => n.id === load.node)) return "Settlement needs a node.";
      return isFiniteNumber(load.uy) ? null : "Enter a displacement.";
    default:
      return exhaustive(load);
  }
}

function replaceCase(doc: BeamDocument, caseId: CaseId, update: (c: LoadCase) => LoadCase): readonly LoadCase[] {
  return doc.loadCases.map((c) => (c.id === caseId ? update(c) : c));
}

export function addLoad(doc: BeamDocument, args: { caseId: CaseId; load: Load }): CommandResult {
  if (!doc.loadCases.some((c) => c.id === args.caseId)) return refused("not-found", "That load case no longer exists.");
  const problem = checkLoad(doc, args.load);
  if (problem) return refused("invalid-value", problem);
  return changed(doc, "Add load", {
    loadCases: replaceCase(doc, args.caseId, (c) => ({ ...c, loads: [...c.loads, args.load] })),
  });
}

/** Replaces a load's values (same id); may move it to another case with `caseId`. */
export function editLoad(doc: BeamDocument, args: { loadId: LoadId; load: Load; caseId?: CaseId }): CommandResult {
  const found = findLoad(doc, args.loadId);
  if (!found) return refused("not-found", "That load no longer exists.");
  const load = { ...args.load, id: args.loadId } as Load;
  const problem = checkLoad(doc, load);
  if (problem) return refused("invalid-value", problem);
  const target = args.caseId ?? found.loadCase.id;
  if (!doc.loadCases.some((c) => c.id === target)) return refused("not-found", "That load case no longer exists.");
  if (target === found.loadCase.id) {
    return changed(doc, "Edit load", {
      loadCases: replaceCase(doc, target, (c) => ({ ...c, loads: c.loads.map((l) => (l.id === load.id ? load : l)) })),
    });
  }
  return changed(doc, "Move load to case", {
    loadCases: doc.loadCases.map((c) =>
      c.id === found.loadCase.id
        ? { ...c, loads: c.loads.filter((l) => l.id !== load.id) }
        : c.id === target
          ? { ...c, loads: [...c.loads, load] }
          : c,
    ),
  });
}

/** Moves a load to start at x (m); a distributed load keeps its length and is kept on the beam. */
export function moveLoad(doc: BeamDocument, args: { loadId: LoadId; x: number }): CommandResult {
  const found = findLoad(doc, args.loadId);
  if (!found) return refused("not-found", "That load no longer exists.");
  const [x0, x1] = beamRange(doc);
  const l = found.load;
  let moved: Load;
  switch (l.type) {
    case "point":
    case "moment":
      moved = { ...l, x: Math.min(Math.max(args.x, x0), x1) };
      break;
    case "distributed": {
      const length = l.x2 - l.x1;
      const start = Math.min(Math.max(args.x, x0), x1 - length);
      moved = { ...l, x1: start, x2: start + length };
      break;
    }
    case "settlement":
      return refused("invalid-position", "A settlement stays at its node.");
    default:
      return exhaustive(l);
  }
  const result = editLoad(doc, { loadId: l.id, load: moved });
  return result.ok ? { ok: true, change: { ...result.change, label: "Move load" } } : result;
}

export function deleteLoad(doc: BeamDocument, args: { loadId: LoadId }): CommandResult {
  const found = findLoad(doc, args.loadId);
  if (!found) return refused("not-found", "That load no longer exists.");
  return changed(doc, "Delete load", {
    loadCases: replaceCase(doc, found.loadCase.id, (c) => ({ ...c, loads: c.loads.filter((l) => l.id !== args.loadId) })),
  });
}
