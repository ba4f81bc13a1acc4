import type { ProjectUnits } from "@spanwright/contracts";
import { describeScheduleLoad } from "../../revisions/describeScheduleLoad";

/**
 * A read-only overview of a revision's model (exchange format, SI): supports and load cases with
 * their loads in the project's units. The editor remains the place to change anything.
 */

function isRecord(v: unknown): v is Record<string, unknown> {
  return typeof v === "object" && v !== null && !Array.isArray(v);
}

function arrayOf(model: Record<string, unknown>, key: string): Record<string, unknown>[] {
  const v = model[key];
  return Array.isArray(v) ? v.filter(isRecord) : [];
}

export function ModelOverview({ model, units }: { model: Record<string, unknown>; units: ProjectUnits }) {
  const nodes = arrayOf(model, "nodes");
  const loadCases = arrayOf(model, "loadCases");
  const combinations = arrayOf(model, "combinations");
  const xs = nodes.map((n) => (typeof n.x === "number" ? n.x : 0));
  const length = xs.length > 1 ? Math.max(...xs) - Math.min(...xs) : 0;
  const supports = nodes.flatMap((n, i) => {
    if (!isRecord(n.support) || typeof n.support.type !== "string" || typeof n.x !== "number") return [];
    return [{ i, x: n.x, type: n.support.type }];
  });
  const len = (si: number) => `${Number((si / units.length.toSI).toPrecision(6))} ${units.length.label}`;

  return (
    <div className="grid gap-6 text-sm md:grid-cols-2">
      <div>
        <h3 className="mb-1 font-semibold text-ink-900">Geometry</h3>
        <p className="text-paper-700">{`Length ${len(length)}, ${nodes.length} nodes, ${supports.length} supports.`}</p>
        <ul className="mt-2 space-y-0.5 text-paper-800">
          {supports.map((s, k) => (
            <li key={s.i} className="tabular">{`S${k + 1}: ${s.type} at ${len(s.x)}`}</li>
          ))}
        </ul>
      </div>
      <div>
        <h3 className="mb-1 font-semibold text-ink-900">Load cases</h3>
        <ul className="space-y-2">
          {loadCases.map((lc, k) => {
            const loads = Array.isArray(lc.loads) ? lc.loads.filter(isRecord) : [];
            return (
              <li key={typeof lc.id === "string" ? lc.id : k}>
                <span className="font-medium text-ink-800">{`${String(lc.id)} (${String(lc.category)})${lc.pattern === true ? ", pattern loading" : ""}`}</span>
                <ul className="ml-4 list-disc text-paper-800">
                  {loads.map((l, j) => (
                    <li key={j} className="tabular">{typeof l.type === "string" ? describeScheduleLoad({ ...l, type: l.type }, units) : "load"}</li>
                  ))}
                </ul>
              </li>
            );
          })}
        </ul>
        {combinations.length > 0 && (
          <>
            <h3 className="mb-1 mt-3 font-semibold text-ink-900">Combinations</h3>
            <ul className="space-y-0.5 text-paper-800">
              {combinations.map((c, k) => (
                <li key={k} className="tabular">
                  {`${String(c.id)} = ${isRecord(c.factors) ? Object.entries(c.factors).map(([id, f]) => `${String(f)}·${id}`).join(" + ") : ""}`}
                </li>
              ))}
            </ul>
          </>
        )}
      </div>
    </div>
  );
}
