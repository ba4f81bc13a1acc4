import type { BeamDocument } from "../model/BeamDocument";
import type { ResultTarget } from "../store/uiState";

function encode(t: ResultTarget): string {
  return `${t.kind}|${t.id}`;
}

function decode(value: string): ResultTarget | null {
  const [kind, id] = value.split("|");
  if (!id) return null;
  if (kind === "case") return { kind, id: id as Extract<ResultTarget, { kind: "case" }>["id"] };
  if (kind === "combination") return { kind, id: id as Extract<ResultTarget, { kind: "combination" }>["id"] };
  if (kind === "envelope") return { kind, id: id as Extract<ResultTarget, { kind: "envelope" }>["id"] };
  return null;
}

/** Choose what the diagrams show: a load case, a combination, or an envelope (max/min bands). */
export function ResultTargetSelect({ doc, value, onChange }: { doc: BeamDocument; value: ResultTarget | null; onChange: (t: ResultTarget) => void }) {
  return (
    <select
      aria-label="Results for"
      className="rounded-sm border border-paper-300 bg-white px-1 py-0.5 text-sm"
      value={value ? encode(value) : ""}
      onChange={(e) => {
        const t = decode(e.target.value);
        if (t) onChange(t);
      }}
    >
      {doc.combinations.length > 0 && (
        <optgroup label="Envelopes">
          <option value="envelope|*">Envelope of all combinations</option>
          {doc.combinations.map((k) => (
            <option key={k.id} value={`envelope|${k.id}`}>Envelope {k.name}</option>
          ))}
        </optgroup>
      )}
      {doc.combinations.length > 0 && (
        <optgroup label="Combinations (all pattern pieces loaded)">
          {doc.combinations.map((k) => (
            <option key={k.id} value={`combination|${k.id}`}>{k.name}</option>
          ))}
        </optgroup>
      )}
      <optgroup label="Load cases (unfactored)">
        {doc.loadCases.map((c) => (
          <option key={c.id} value={`case|${c.id}`}>{c.name} ({c.category})</option>
        ))}
      </optgroup>
    </select>
  );
}
