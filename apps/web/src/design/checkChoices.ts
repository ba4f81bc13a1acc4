import type { BeamDesignSettings, DesignDeflectionRule, DesignSectionChoice } from "@spanwright/contracts";
import { DEFLECTION_LIMIT_PRESETS, type CbRule, type DesignMethod, type Material } from "@spanwright/solver/design";
import { defaultRules, TYPED_LIMIT, type DeflectionRule } from "./DeflectionRules";
import { caseIds, combinationIds, type DesignModel } from "./designModel";

/**
 * What the Checks panel asks beside the section and material, SI: the parts of the beam's saved
 * design settings (`BeamDesignSettings`) the panel edits. Deflection rules keep the panel's form
 * (a preset id or a typed ratio as text) so a half-typed ratio survives a re-render.
 */
export interface CheckChoices {
  readonly method: DesignMethod;
  /** Brace spacing of the compression flange, m; null: braced at the supports only. */
  readonly lb: number | null;
  readonly cb: CbRule;
  readonly strengthIds: readonly string[];
  readonly rules: readonly DeflectionRule[];
  /** Elastic allowables, Pa; null: that check is left out. */
  readonly allowableBending: number | null;
  readonly allowableShear: number | null;
}

/** Every combination, or the load cases when the model has none: the report's default too. */
export function defaultStrengthIds(model: DesignModel): string[] {
  const combos = combinationIds(model);
  return combos.length > 0 ? combos : caseIds(model);
}

function liveCaseIds(model: DesignModel): string[] {
  return model.loadCases.filter((c) => c.category === "live").map((c) => c.id);
}

export function defaultChoices(model: DesignModel): CheckChoices {
  return {
    method: "LRFD",
    lb: null,
    cb: "equation-f1-1",
    strengthIds: defaultStrengthIds(model),
    rules: defaultRules(liveCaseIds(model)),
    allowableBending: null,
    allowableShear: null,
  };
}

function ruleOf(saved: DesignDeflectionRule, key: number): DeflectionRule {
  const { limit, ids } = saved;
  if (limit.kind === "ratio") return { key, choice: TYPED_LIMIT, ratioText: String(limit.ratio), ids };
  return { key, choice: limit.presetId, ratioText: String(DEFLECTION_LIMIT_PRESETS.find((p) => p.id === limit.presetId)?.ratio ?? 360), ids };
}

/** The panel's choices from saved settings; what they leave out (null) takes the defaults. */
export function choicesFromSettings(settings: BeamDesignSettings | null | undefined, model: DesignModel): CheckChoices {
  const base = defaultChoices(model);
  if (!settings) return base;
  return {
    method: settings.method,
    lb: settings.lb,
    cb: settings.cb,
    strengthIds: settings.strengthIds ?? base.strengthIds,
    rules: settings.deflection ? settings.deflection.map((r, i) => ruleOf(r, i + 1)) : base.rules,
    allowableBending: settings.allowableBending,
    allowableShear: settings.allowableShear,
  };
}

/**
 * Choices carried over when the checks start again on changed cases or combinations (the editor's
 * table, or combinations generated on the design page): ids the model no longer has are dropped,
 * and the default (every combination, or the load cases when there were none) stays the default,
 * so new combinations join the strength checks.
 */
export function carryChoices(choices: CheckChoices, before: DesignModel, now: DesignModel): CheckChoices {
  const known = new Set([...caseIds(now), ...combinationIds(now)]);
  const wasDefault = sameValue([...choices.strengthIds].sort(), defaultStrengthIds(before).sort());
  return {
    ...choices,
    strengthIds: wasDefault ? defaultStrengthIds(now) : choices.strengthIds.filter((id) => known.has(id)),
    rules: choices.rules.map((r) => ({ ...r, ids: r.ids.filter((id) => known.has(id)) })),
  };
}

/** A saved rule, or null while its typed ratio is not a number greater than zero. */
function savedRule(rule: DeflectionRule): DesignDeflectionRule | null {
  if (rule.choice !== TYPED_LIMIT) return { limit: { kind: "preset", presetId: rule.choice }, ids: [...rule.ids] };
  const ratio = Number(rule.ratioText);
  return ratio > 0 && Number.isFinite(ratio) ? { limit: { kind: "ratio", ratio }, ids: [...rule.ids] } : null;
}

export type SettingsDraft = { ok: true; settings: BeamDesignSettings } | { ok: false; message: string };

/**
 * The settings to save. `material` null keeps a project section's own material. Strength cases
 * equal to the default are saved as null, so a later combination joins the checks; the deflection
 * rules are saved as shown, so the report prints exactly the limits the panel showed.
 */
export function settingsOf(section: DesignSectionChoice | null, material: Material | null, choices: CheckChoices, model: DesignModel): SettingsDraft {
  const rules = choices.rules.map(savedRule);
  if (rules.some((r) => r === null)) return { ok: false, message: "Type a ratio greater than zero for every deflection limit before saving." };
  const defaults = defaultStrengthIds(model);
  const sameAsDefault = choices.strengthIds.length === defaults.length && defaults.every((id) => choices.strengthIds.includes(id));
  return {
    ok: true,
    settings: {
      section,
      material: material ? { ...material } : null,
      method: choices.method,
      lb: choices.lb,
      cb: choices.cb,
      strengthIds: sameAsDefault ? null : [...choices.strengthIds],
      deflection: rules as DesignDeflectionRule[],
      allowableBending: choices.allowableBending,
      allowableShear: choices.allowableShear,
    },
  };
}

/**
 * Whether two plain values say the same: key order and absent-vs-undefined aside, numbers to 12
 * significant digits (a length typed in feet and read back in metres may move by an ulp).
 */
export function sameValue(a: unknown, b: unknown): boolean {
  const canonical = (v: unknown): unknown => {
    if (typeof v === "number") return Number(v.toPrecision(12));
    if (Array.isArray(v)) return v.map(canonical);
    if (v === null || typeof v !== "object") return v;
    return Object.fromEntries(
      Object.entries(v)
        .filter(([, x]) => x !== undefined)
        .sort(([p], [q]) => (p < q ? -1 : 1))
        .map(([k, x]) => [k, canonical(x)]),
    );
  };
  return JSON.stringify(canonical(a ?? null)) === JSON.stringify(canonical(b ?? null));
}

export function sameSettings(a: BeamDesignSettings | null | undefined, b: BeamDesignSettings | null | undefined): boolean {
  return sameValue(a, b);
}
