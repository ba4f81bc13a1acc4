import { useEffect, useMemo, useRef, useState, type ReactNode } from "react";
import {
  governingRow,
  propertiesOfValidShape,
  validateSectionShape,
  type CbRule,
  type DesignMethod,
  type Material,
  type ResultLike,
  type SectionShape,
} from "@spanwright/solver/design";
import { Alert } from "../components/Alert";
import { SelectField } from "../components/SelectField";
import { TextField } from "../components/TextField";
import { formatNumber } from "../editor/units/formatQuantity";
import type { UnitSystemId } from "../editor/units/unitSystems";
import { CheckTable } from "./CheckTable";
import { computeBeamChecks } from "./computeBeamChecks";
import { defaultChoices, type CheckChoices } from "./checkChoices";
import { DeflectionRules, limitOfRule, type DeflectionRule } from "./DeflectionRules";
import { DesignCaution } from "./DesignCaution";
import { caseIds, combinationIds, type DesignModel } from "./designModel";
import { designUnit, editableDesign, formatDesign, fromDesignDisplay } from "./designUnits";
import { IdChecklist } from "./IdChecklist";

export interface ChecksPanelProps {
  /** Exchange-format model (`toExchange(doc)` or a saved revision's model). */
  readonly model: DesignModel;
  /** Its result, if any; solved again when it lacks the stations the checks need. */
  readonly result?: ResultLike | null;
  readonly units: UnitSystemId;
  /** Section and material to check (from SectionEditor and MaterialPicker), SI. */
  readonly shape: SectionShape;
  readonly material: Material;
  /**
   * The engine's `solve` (or any function returning an exchange-format result), used when `result`
   * lacks the check stations. Optional so the panel itself never imports the engine.
   */
  readonly solveModel?: (model: unknown) => ResultLike;
  /** Method, Lb, Cb, cases, deflection limits and allowables to start from (e.g. the beam's saved ones); default LRFD, braced at the supports, all combinations, IBC floor limits. */
  readonly initial?: CheckChoices;
  /** Told every change of those choices (SI), e.g. to save them with the beam. */
  readonly onChoicesChange?: (choices: CheckChoices) => void;
  /** Shows the choices without letting them change (viewers and checkers). */
  readonly readOnly?: boolean;
  /** Shown under the table, above the caution: e.g. the link to the PDF report with these checks. */
  readonly footer?: ReactNode;
}

const CB_OPTIONS: { value: CbRule; label: string }[] = [
  { value: "equation-f1-1", label: "From the moment diagram (eq. F1-1)" },
  { value: "unity", label: "1.0 (conservative, §F1)" },
];

/** Optional positive number typed in display units; null when blank or not a positive number. */
function parsePositive(text: string, units: UnitSystemId, quantity: "length" | "stress"): number | null {
  const n = Number(text);
  return text.trim() === "" || !(n > 0) ? null : fromDesignDisplay(n, units, quantity);
}

/** Member checks per span for the given section and material, with their inputs, formulas and clauses. */
export function ChecksPanel({ model, result = null, units, shape, material, solveModel, initial, onChoicesChange, readOnly = false, footer }: ChecksPanelProps) {
  const combos = combinationIds(model);
  const cases = caseIds(model);
  const [start] = useState(() => initial ?? defaultChoices(model));
  const text = (si: number | null, quantity: "length" | "stress") => (si === null ? "" : editableDesign(si, units, quantity));
  const [method, setMethod] = useState<DesignMethod>(start.method);
  const [lbText, setLbText] = useState(() => text(start.lb, "length"));
  const [cb, setCb] = useState<CbRule>(start.cb);
  const [strengthIds, setStrengthIds] = useState<string[]>(() => [...start.strengthIds]);
  const [rules, setRules] = useState<DeflectionRule[]>(() => [...start.rules]);
  const [allowBendingText, setAllowBendingText] = useState(() => text(start.allowableBending, "stress"));
  const [allowShearText, setAllowShearText] = useState(() => text(start.allowableShear, "stress"));

  const Lb = parsePositive(lbText, units, "length");
  const allowableBending = parsePositive(allowBendingText, units, "stress");
  const allowableShear = parsePositive(allowShearText, units, "stress");
  const choices = useMemo<CheckChoices>(
    () => ({ method, lb: Lb, cb, strengthIds, rules, allowableBending, allowableShear }),
    [method, Lb, cb, strengthIds, rules, allowableBending, allowableShear],
  );
  // The latest callback without making it a dependency: a parent passing a new function each render must not loop.
  const report = useRef(onChoicesChange);
  report.current = onChoicesChange;
  useEffect(() => {
    report.current?.(choices);
  }, [choices]);

  const validShape = useMemo(() => validateSectionShape(shape), [shape]);
  const isIShape = shape.kind === "i-shape";

  const outcome = useMemo(() => {
    if (!validShape.ok) return { ok: false as const, code: "invalid-input" as const, message: `Section: ${validShape.error.message}` };
    const deflection = rules.flatMap((r) => {
      const limit = limitOfRule(r);
      return limit ? r.ids.map((id) => ({ id, limit })) : [];
    });
    return computeBeamChecks({
      model, result, shape: validShape.value, material, method, Lb, cb, strengthIds, deflection, ...(solveModel ? { solveModel } : {}),
      allowableBending,
      allowableShear,
    });
  }, [model, result, validShape, material, method, Lb, cb, strengthIds, rules, allowableBending, allowableShear, solveModel]);

  const sectionI = validShape.ok ? propertiesOfValidShape(validShape.value).I : null;
  const mismatched = sectionI !== null && model.segments.some((s) => Math.abs(s.I - sectionI) > 0.02 * sectionI);
  const worst = outcome.ok ? governingRow(outcome.rows) : undefined;

  return (
    <div className="space-y-4">
      {/* A disabled fieldset makes every control inside read-only at once. */}
      <fieldset disabled={readOnly} className="min-w-0 space-y-4">
        <div className="grid gap-3 md:grid-cols-4">
          <div className="text-sm">
            <p className="font-medium text-ink-800">Material</p>
            <p className="text-paper-700">{material.name}</p>
            <p className="text-xs text-paper-600">
              E = {formatDesign(material.E, units, "stress")}
              {material.Fy !== undefined ? `, Fy = ${formatDesign(material.Fy, units, "stress")}` : ""}
              {material.typical ? " (typical, confirm)" : ""}
            </p>
          </div>
          {isIShape && (
            <SelectField label="Design method" name="design-method" value={method} options={[{ value: "LRFD", label: "LRFD (φ)" }, { value: "ASD", label: "ASD (Ω)" }]} onChange={(e) => setMethod(e.target.value as DesignMethod)} />
          )}
          {isIShape && (
            <TextField label={`Unbraced length Lb (${designUnit(units, "length")})`} name="Lb" inputMode="decimal" value={lbText} placeholder="braced at supports only" hint="Braces every Lb from the start of each span" onChange={(e) => setLbText(e.target.value)} />
          )}
          {isIShape && (
            <SelectField label="Cb (lateral-torsional buckling)" name="cb" value={cb} options={CB_OPTIONS} onChange={(e) => setCb(e.target.value === "unity" ? "unity" : "equation-f1-1")} />
          )}
          {!isIShape && (
            <TextField label={`Allowable bending stress (${designUnit(units, "stress")})`} name="allowable-bending" inputMode="decimal" value={allowBendingText} onChange={(e) => setAllowBendingText(e.target.value)} />
          )}
          {!isIShape && (
            <TextField label={`Allowable shear stress (${designUnit(units, "stress")})`} name="allowable-shear" inputMode="decimal" value={allowShearText} onChange={(e) => setAllowShearText(e.target.value)} />
          )}
        </div>
        <IdChecklist legend={isIShape ? `Strength checks (${method} combinations)` : "Stress checks for"} ids={[...combos, ...cases]} selected={strengthIds} onChange={setStrengthIds} />
        <DeflectionRules rules={rules} ids={[...cases, ...combos]} onChange={setRules} />
      </fieldset>
      {combos.length === 0 && <Alert tone="caution" title="No combinations">Strength checks need factored combinations: generate them from a code preset first.</Alert>}
      {mismatched && (
        <Alert tone="caution" title="Section and analysis differ">
          The beam was analysed with segment I values that differ from this section's I = {formatDesign(sectionI ?? 0, units, "secondMoment")}. Apply the section to the segments and solve again before relying on the checks.
        </Alert>
      )}
      {outcome.ok ? (
        <>
          {worst && worst.check.status !== "not-covered" && (
            <p className="text-sm">
              Governing: <span className="font-medium">{worst.check.title}</span>, {worst.span}, {worst.caseId}, utilisation{" "}
              <span className={`font-mono font-semibold ${worst.check.pass ? "text-success-600" : "text-danger-700"}`}>{formatNumber(worst.check.utilisation, 3)}</span>
            </p>
          )}
          {outcome.notes.map((n) => (
            <p key={n} className="text-xs text-paper-600">{n}</p>
          ))}
          {outcome.resolved && <p className="text-xs text-paper-600">Results read again at the span ends, braces and quarter points for exact Cb and deflections.</p>}
          {outcome.rows.length === 0 ? <p className="text-sm text-paper-600">Choose cases or combinations to check.</p> : <CheckTable rows={outcome.rows} units={units} />}
        </>
      ) : (
        <Alert tone="error" title="Checks not available">{outcome.message}</Alert>
      )}
      {footer}
      <DesignCaution />
    </div>
  );
}
