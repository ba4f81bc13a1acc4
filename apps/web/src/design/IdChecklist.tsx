import { useId } from "react";

/** A row of checkboxes choosing load cases or combinations by id. */
export function IdChecklist({ legend, ids, selected, onChange }: { legend: string; ids: readonly string[]; selected: readonly string[]; onChange: (next: string[]) => void }) {
  const name = useId();
  return (
    <fieldset>
      <legend className="mb-1 text-sm font-medium text-ink-800">{legend}</legend>
      {ids.length === 0 ? (
        <p className="text-xs text-paper-600">None in this beam.</p>
      ) : (
        <div className="flex flex-wrap gap-x-4 gap-y-1">
          {ids.map((id) => (
            <label key={id} className="flex items-center gap-1.5 text-sm">
              <input
                type="checkbox"
                name={name}
                checked={selected.includes(id)}
                onChange={(e) => onChange(e.target.checked ? [...selected, id] : selected.filter((s) => s !== id))}
              />
              <span className="font-mono">{id}</span>
            </label>
          ))}
        </div>
      )}
    </fieldset>
  );
}
