import { DEFLECTION_LIMIT_PRESETS, type DeflectionLimit } from "@spanwright/solver/design";
import { Button } from "../components/Button";
import { SelectField } from "../components/SelectField";
import { TextField } from "../components/TextField";
import { IdChecklist } from "./IdChecklist";

/** One deflection limit and the cases or combinations it applies to. */
export interface DeflectionRule {
  readonly key: number;
  /** A preset id of DEFLECTION_LIMIT_PRESETS, or "typed". */
  readonly choice: string;
  readonly ratioText: string;
  readonly ids: readonly string[];
}

export const TYPED_LIMIT = "typed";

export function limitOfRule(rule: DeflectionRule): DeflectionLimit | null {
  const preset = DEFLECTION_LIMIT_PRESETS.find((p) => p.id === rule.choice);
  if (preset) return { kind: "preset", preset };
  const ratio = Number(rule.ratioText);
  return ratio > 0 ? { kind: "ratio", ratio } : null;
}

/** IBC 2021 Table 1604.3 floor members: L/360 under live load, L/240 under dead + live (from memory, see the presets). */
export function defaultRules(liveIds: readonly string[]): DeflectionRule[] {
  return [
    { key: 1, choice: "floor-live", ratioText: "360", ids: liveIds },
    { key: 2, choice: "floor-total", ratioText: "240", ids: [] },
  ];
}

export function DeflectionRules({ rules, ids, onChange }: { rules: readonly DeflectionRule[]; ids: readonly string[]; onChange: (next: DeflectionRule[]) => void }) {
  const update = (key: number, patch: Partial<DeflectionRule>) => onChange(rules.map((r) => (r.key === key ? { ...r, ...patch } : r)));
  const nextKey = Math.max(0, ...rules.map((r) => r.key)) + 1;
  return (
    <div className="space-y-3">
      {rules.map((rule, i) => (
        <div key={rule.key} className="grid gap-3 rounded-md border border-paper-200 p-3 md:grid-cols-[minmax(0,2fr)_minmax(0,1fr)_minmax(0,3fr)_auto]">
          <SelectField
            label={`Deflection limit ${i + 1}`}
            name={`deflection-limit-${rule.key}`}
            value={rule.choice}
            options={[...DEFLECTION_LIMIT_PRESETS.map((p) => ({ value: p.id, label: p.label })), { value: TYPED_LIMIT, label: "Typed ratio L/n" }]}
            onChange={(e) => update(rule.key, { choice: e.target.value })}
          />
          {rule.choice === TYPED_LIMIT ? (
            <TextField
              label="n in L/n"
              name={`deflection-ratio-${rule.key}`}
              inputMode="decimal"
              value={rule.ratioText}
              error={limitOfRule(rule) === null ? "type a ratio greater than zero" : undefined}
              onChange={(e) => update(rule.key, { ratioText: e.target.value })}
            />
          ) : (
            <div />
          )}
          <IdChecklist legend="Applies to" ids={ids} selected={rule.ids} onChange={(next) => update(rule.key, { ids: next })} />
          <Button variant="ghost" size="sm" className="self-end" onClick={() => onChange(rules.filter((r) => r.key !== rule.key))}>
            Remove
          </Button>
        </div>
      ))}
      <Button variant="secondary" size="sm" onClick={() => onChange([...rules, { key: nextKey, choice: TYPED_LIMIT, ratioText: "360", ids: [] }])}>
        Add a deflection limit
      </Button>
    </div>
  );
}
