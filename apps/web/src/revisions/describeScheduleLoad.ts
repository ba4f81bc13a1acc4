import type { ProjectUnits } from "@spanwright/contracts";
import { formatNumber } from "./reactionUnits";

/**
 * One previewed load in words, in the project's units: the preview shows what will be applied,
 * after the server converted the typed units to SI. Signs as in the exchange format: forces
 * positive upward (gravity negative), moments positive counterclockwise.
 */

type LoadJson = { type: string } & Record<string, unknown>;

function num(load: LoadJson, key: string): number | null {
  const v = load[key];
  return typeof v === "number" && Number.isFinite(v) ? v : null;
}

function short(value: number): string {
  const rounded = Number(value.toPrecision(6));
  return formatNumber(rounded, Math.max(0, Math.min(6, (String(rounded).split(".")[1] ?? "").length)));
}

export function describeScheduleLoad(load: LoadJson, units: ProjectUnits): string {
  const len = (si: number) => `${short(si / units.length.toSI)} ${units.length.label}`;
  const force = (si: number) => `${short(si / units.force.toSI)} ${units.force.label}`;
  const moment = (si: number) => `${short(si / units.moment.toSI)} ${units.moment.label}`;
  const perLength = (si: number) => short((si * units.length.toSI) / units.force.toSI);
  const x = num(load, "x");
  switch (load.type) {
    case "point": {
      const fy = num(load, "fy");
      return x !== null && fy !== null ? `point ${force(fy)} at ${len(x)}` : "point load";
    }
    case "moment": {
      const mz = num(load, "mz");
      return x !== null && mz !== null ? `moment ${moment(mz)} at ${len(x)}` : "applied moment";
    }
    case "distributed": {
      const [x1, x2, q1, q2] = [num(load, "x1"), num(load, "x2"), num(load, "qy1"), num(load, "qy2")];
      if (x1 === null || x2 === null || q1 === null || q2 === null) return "distributed load";
      const unit = `${units.force.label}/${units.length.label}`;
      const q = q1 === q2 ? perLength(q1) : `${perLength(q1)}..${perLength(q2)}`;
      return `distributed ${q} ${unit} from ${len(x1)} to ${len(x2)}`;
    }
    case "settlement": {
      const node = num(load, "node");
      const uy = num(load, "uy");
      // Settlements read in mm or in, finer than the length unit.
      const small = units.system === "si" ? { label: "mm", toSI: 1e-3 } : { label: "in", toSI: 0.0254 };
      return node !== null && uy !== null ? `settlement ${short(uy / small.toSI)} ${small.label} at node ${node}` : "settlement";
    }
    default:
      return load.type;
  }
}
