import { useMemo, useState } from "react";
import {
  COMBINATION_PRESETS,
  generateCombinations,
  type CombinationPresetId,
  type GeneratedCombination,
  type GenerateOptions,
  type ImposedLoadCategory,
  type LoadCaseRef,
  type SnowSite,
} from "@spanwright/solver/design";
import { Button } from "../components/Button";
import { SelectField } from "../components/SelectField";

export interface CombinationGeneratorProps {
  /** Load cases present, by their exchange-format id (the case name) and category. */
  readonly cases: readonly LoadCaseRef[];
  /** Combination ids already in the beam, so generated ids do not collide. */
  readonly takenIds?: readonly string[];
  /** Receives the combinations in the contract's shape (id, factors by case id) plus source labels. */
  readonly onApply: (combinations: readonly GeneratedCombination[]) => void;
  readonly initialPreset?: CombinationPresetId;
}

/** Choose a code preset, preview what it generates for the cases present, then apply. */
export function CombinationGenerator({ cases, takenIds, onApply, initialPreset = "asce7-22-strength" }: CombinationGeneratorProps) {
  const [presetId, setPresetId] = useState<CombinationPresetId>(initialPreset);
  const [companionLive, setCompanionLive] = useState<NonNullable<GenerateOptions["companionLive"]>>("full");
  const [imposed, setImposed] = useState<ImposedLoadCategory>("A-D");
  const [snowSite, setSnowSite] = useState<SnowSite>("altitude-up-to-1000m");

  const set = useMemo(
    () => generateCombinations(presetId, cases, { companionLive, imposed, snowSite, ...(takenIds ? { takenIds } : {}) }),
    [presetId, cases, companionLive, imposed, snowSite, takenIds],
  );
  const isAsce = presetId !== "en1990-6.10";

  return (
    <div className="space-y-4">
      <div className="grid gap-3 md:grid-cols-3">
        <SelectField
          label="Preset"
          name="combination-preset"
          value={presetId}
          options={COMBINATION_PRESETS.map((p) => ({ value: p.id, label: `${p.name} (${p.source})` }))}
          onChange={(e) => setPresetId(e.target.value as CombinationPresetId)}
        />
        {presetId === "asce7-22-strength" && (
          <SelectField
            label="Companion live load"
            name="companion-live"
            value={companionLive}
            options={[
              { value: "full", label: "1.0L in combinations 3, 4, 6" },
              { value: "half-per-exception-1", label: "0.5L (§2.3.1 Exception 1)" },
            ]}
            onChange={(e) => setCompanionLive(e.target.value as typeof companionLive)}
          />
        )}
        {!isAsce && (
          <>
            <SelectField
              label="Imposed load category (ψ0)"
              name="imposed-category"
              value={imposed}
              options={[
                { value: "A-D", label: "A–D: ψ0 = 0.7" },
                { value: "E", label: "E storage: ψ0 = 1.0" },
              ]}
              onChange={(e) => setImposed(e.target.value as ImposedLoadCategory)}
            />
            <SelectField
              label="Snow site (ψ0)"
              name="snow-site"
              value={snowSite}
              options={[
                { value: "altitude-up-to-1000m", label: "Up to 1000 m: ψ0 = 0.5" },
                { value: "above-1000m-or-nordic", label: "Above 1000 m or Nordic: ψ0 = 0.7" },
              ]}
              onChange={(e) => setSnowSite(e.target.value as SnowSite)}
            />
          </>
        )}
      </div>

      {set.combinations.length === 0 ? (
        <p className="text-sm text-paper-600">This preset generates no combination for the load cases present.</p>
      ) : (
        <table className="w-full text-sm" aria-label="Generated combinations">
          <thead>
            <tr className="border-b border-paper-300 text-left text-xs uppercase tracking-wide text-paper-600">
              <th className="py-1 pr-3">Id</th>
              <th className="py-1 pr-3">Combination</th>
              <th className="py-1 pr-3">Clause expression</th>
              <th className="py-1">Source</th>
            </tr>
          </thead>
          <tbody>
            {set.combinations.map((c) => (
              <tr key={c.id} className="border-b border-paper-200">
                <td className="py-1 pr-3 font-mono">{c.id}</td>
                <td className="py-1 pr-3 font-mono text-ink-900">{c.label}</td>
                <td className="py-1 pr-3 text-paper-700">{c.expression}</td>
                <td className="py-1 text-paper-700">{c.source}</td>
              </tr>
            ))}
          </tbody>
        </table>
      )}

      {set.skipped.length > 0 && (
        <ul className="list-disc pl-5 text-sm text-caution-700" aria-label="Cases not combined">
          {set.skipped.map((s) => (
            <li key={s.caseId}>
              {s.caseId} ({s.category}): {s.reason}
            </li>
          ))}
        </ul>
      )}
      <ul className="space-y-1 text-xs text-paper-600" aria-label="Notes">
        {set.notes.map((n) => (
          <li key={n}>{n}</li>
        ))}
      </ul>
      <div className="flex items-center gap-3">
        <Button disabled={set.combinations.length === 0} onClick={() => onApply(set.combinations)}>
          Apply {set.combinations.length} combinations
        </Button>
        <span className="text-xs text-paper-600">You can edit them afterwards in the combination table.</span>
      </div>
    </div>
  );
}
