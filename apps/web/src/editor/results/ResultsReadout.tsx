import { useMemo } from "react";
import type { Analysis, Quantity } from "@spanwright/solver";
import { formatQuantity } from "../units/formatQuantity";
import type { UnitSystemId } from "../units/unitSystems";
import { quantityInfo } from "./DiagramRow";
import { quantities, readAt, reactionsFor, seriesFor } from "./resultSeries";

function pair(values: readonly [number, number], units: UnitSystemId, q: Quantity, isEnvelope: boolean): string {
  const kind = quantityInfo[q].kind;
  if (!Number.isFinite(values[0])) return "—";
  return isEnvelope ? `${formatQuantity(values[0], units, kind, 5)} / ${formatQuantity(values[1], units, kind, 5)}` : formatQuantity(values[0], units, kind, 5);
}

/** Exact numbers beside the diagrams: the hover cursor's values, extremes, reactions. */
export function ResultsReadout({ analysis, name, isEnvelope, hoverX, units }: { analysis: Analysis; name: string; isEnvelope: boolean; hoverX: number | null; units: UnitSystemId }) {
  const at = hoverX === null ? null : readAt(analysis, name, isEnvelope, hoverX);
  // Extremes and reactions depend on the result only; the hover cursor must not recompute them.
  const reactions = useMemo(() => reactionsFor(analysis, name, isEnvelope), [analysis, name, isEnvelope]);
  const extremes = useMemo(
    () => quantities.filter((q) => q !== "rz").map((q) => ({ q, s: seriesFor(analysis, name, isEnvelope, q) })),
    [analysis, name, isEnvelope],
  );
  return (
    <div className="space-y-3 text-sm">
      <section aria-live="polite">
        <h3 className="text-xs font-semibold text-paper-600">
          {hoverX === null ? "Point at a diagram to read values" : `At x = ${formatQuantity(hoverX, units, "position", 6)}`}
          {isEnvelope && hoverX !== null ? " (max / min)" : ""}
        </h3>
        {at && (
          <dl className="mt-1 grid grid-cols-[auto_1fr] gap-x-3 font-mono text-xs tabular-nums">
            {quantities.map((q) => (
              <div key={q} className="contents">
                <dt className="text-paper-600">{q === "uy" ? "δ" : q === "rz" ? "θ" : q}</dt>
                <dd>{pair(at[q], units, q, isEnvelope)}</dd>
              </div>
            ))}
          </dl>
        )}
      </section>
      <section>
        <h3 className="text-xs font-semibold uppercase tracking-wide text-paper-600">Extremes (exact)</h3>
        <dl className="mt-1 grid grid-cols-[auto_1fr] gap-x-3 font-mono text-xs tabular-nums">
          {extremes.map(({ q, s }) =>
            s?.max && s.min ? (
              <div key={q} className="contents">
                <dt className="text-paper-600">{q === "uy" ? "δ" : q}</dt>
                <dd>
                  max {formatQuantity(s.max.value, units, quantityInfo[q].kind, 5)} at {formatQuantity(s.max.x, units, "position", 5)}; min{" "}
                  {formatQuantity(s.min.value, units, quantityInfo[q].kind, 5)} at {formatQuantity(s.min.x, units, "position", 5)}
                </dd>
              </div>
            ) : null,
          )}
        </dl>
      </section>
      <section>
        <h3 className="text-xs font-semibold uppercase tracking-wide text-paper-600">Moment at supports{isEnvelope ? " (max / min)" : ""}</h3>
        <dl className="mt-1 grid grid-cols-[auto_1fr] gap-x-3 font-mono text-xs tabular-nums">
          {reactions.map((r) => {
            const m = readAt(analysis, name, isEnvelope, r.x)?.M;
            return m ? (
              <div key={r.node} className="contents">
                <dt className="text-paper-600">x = {formatQuantity(r.x, units, "position", 5)}</dt>
                <dd>{pair(m, units, "M", isEnvelope)}</dd>
              </div>
            ) : null;
          })}
        </dl>
      </section>
      <section>
        <h3 className="text-xs font-semibold uppercase tracking-wide text-paper-600">Reactions{isEnvelope ? " (max / min)" : ""}</h3>
        <table className="mt-1 w-full font-mono text-xs tabular-nums [&_td]:pr-2 [&_th]:pr-2">
          <thead className="text-left text-paper-600">
            <tr>
              <th className="font-normal">x</th>
              <th className="font-normal">Fy (up +)</th>
              <th className="font-normal">Mz (CCW +)</th>
            </tr>
          </thead>
          <tbody>
            {reactions.map((r) => (
              <tr key={r.node}>
                <td>{formatQuantity(r.x, units, "position", 5)}</td>
                <td>{isEnvelope ? `${formatQuantity(r.fy[0], units, "force", 5)} / ${formatQuantity(r.fy[1], units, "force", 5)}` : formatQuantity(r.fy[0], units, "force", 5)}</td>
                <td>{isEnvelope ? `${formatQuantity(r.mz[0], units, "moment", 5)} / ${formatQuantity(r.mz[1], units, "moment", 5)}` : formatQuantity(r.mz[0], units, "moment", 5)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </section>
    </div>
  );
}
