import { useMemo, useState } from "react";
import {
  governingRow,
  propertiesOfValidShape,
  validateSectionShape,
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
import { DeflectionRules, defaultRules, limitOfRule, type DeflectionRule } from "./DeflectionRules";
import { DesignCaution } from "./DesignCaution";
import { caseIds, combinationIds, type DesignModel } from "./designModel";
import { designUnit, formatDesign, fromDesignDisplay } from "./designUnits";
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
}

function liveCaseIds(model: DesignModel): string[] {
  return model.loadCases.filter((c) => c.category === "live").map((c) => c.id);
}

/** Optional positive number typed in display units; null when blank or not a positive number. */
function parsePositive(text: string, units: UnitSystemId, quantity: "length" | "stress"): number | null {
  const n = Number(text);
  return text.trim() === "" || !(n > 0) ? null : fromDesignDisplay(n, units, quantity);
}

/** Member checks per span for the given section and material, with their inputs, formulas and clauses. */
export function ChecksPanel({ model, result = null, units, shape, material, solveModel }: ChecksPanelProps) {
  const combos = combinationIds(model);
  const cases = caseIds(model);
  const [method, setMethod] = useState<DesignMethod>("LRFD");
  const [lbText, setLbText] = useState("");
  const [strengthIds, setStrengthIds] = useState<string[]>(() => (combos.length > 0 ? combos : cases));
  const [rules, setRules] = useState<DeflectionRule[]>(() => defaultRules(liveCaseIds(model)));
  const [allowBendingText, setAllowBendingText] = useState("");
  const [allowShearText, setAllowShearText] = useState("");

  const Lb = parsePositive(lbText, units, "length");
  const validShape = useMemo(() => validateSectionShape(shape), [shape]);
  const isIShape = shape.kind === "i-shape";

  const outcome = useMemo(() => {
    if (!validShape.ok) return { ok: false as const, code: "invalid-input" as const, message: `Section: ${validShape.error.message}` };
    const deflection = rules.flatMap((r) => {
      const limit = limitOfRule(r);
      return limit ? r.ids.map((id) => ({ id, limit })) : [];
    });
    return computeBeamChecks({
      model, result, shape: validShape.value, material, method, Lb, strengthIds, deflection, ...(solveModel ? { solveModel } : {}),
      allowableBending: parsePositive(allowBendingText, units, "stress"),
      allowableShear: parsePositive(allowShearText, units, "stress"),
    });
  }, [model, result, validShape, material, method, Lb, strengthIds, rules, allowBendingText, allowShearText, units, solveModel]);

  const sectionI = validShape.ok ? propertiesOfValidShape(validShape.value).I : null;
  const mismatched = sectionI !== null && model.segments.some((s) => Math.abs(s.I - sectionI) > 0.02 * sectionI);
  const worst = outcome.ok ? governingRow(outcome.rows) : undefined;

  return (
    <div className="space-y-4">
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
        {!isIShape && (
          <TextField label={`Allowable bending stress (${designUnit(units, "stress")})`} name="allowable-bending" inputMode="decimal" value={allowBendingText} onChange={(e) => setAllowBendingText(e.target.value)} />
        )}
        {!isIShape && (
          <TextField label={`Allowable shear stress (${designUnit(units, "stress")})`} name="allowable-shear" inputMode="decimal" value={allowShearText} onChange={(e) => setAllowShearText(e.target.value)} />
        )}
      </div>
      <IdChecklist legend={isIShape ? `Strength checks (${method} combinations)` : "Stress checks for"} ids={[...combos, ...cases]} selected={strengthIds} onChange={setStrengthIds} />
      <DeflectionRules rules={rules} ids={[...cases, ...combos]} onChange={setRules} />
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
      <DesignCaution />
    </div>
  );
}
