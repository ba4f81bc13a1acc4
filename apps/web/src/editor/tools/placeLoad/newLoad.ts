import type { Load } from "../../model/BeamDocument";
import { createLoadId } from "../../model/ids";
import type { ToolOptions } from "../../store/uiState";

// Starting magnitudes for a load placed by pointer (gravity negative, per the contract's signs):
// 10 kN, 10 kN·m, 5 kN/m. The inspector opens on the new load so the real value is typed next.
const POINT_FY = -10_000; // N
const MOMENT_MZ = 10_000; // N·m, counterclockwise
const LINE_QY = -5_000; // N/m

export function newLoad(type: ToolOptions["loadType"], x1: number, x2: number): Load {
  const id = createLoadId();
  switch (type) {
    case "point":
      return { id, type, x: x1, fy: POINT_FY };
    case "moment":
      return { id, type, x: x1, mz: MOMENT_MZ };
    case "distributed":
      return { id, type, x1: Math.min(x1, x2), x2: Math.max(x1, x2), qy1: LINE_QY, qy2: LINE_QY };
  }
}
