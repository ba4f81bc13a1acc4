import { useMemo, useState } from "react";
import { analyze, SolverError, valuesAt, type BeamModel } from "@spanwright/solver";
import type { Material, SectionShape } from "@spanwright/solver/design";
import { Alert } from "../components/Alert";
import { SelectField } from "../components/SelectField";
import { TextField } from "../components/TextField";
import type { UnitSystemId } from "../editor/units/unitSystems";
import { designUnit, editableDesign, fromDesignDisplay } from "./designUnits";
import { SectionView } from "./SectionView";

export interface SectionAtXProps {
  /** A validated engine model (`beamModelSchema` output). */
  readonly model: BeamModel;
  readonly shape: SectionShape;
  readonly material: Material;
  readonly units: UnitSystemId;
}

/** An x chooser and a case/combination chooser feeding SectionView with M, V and rz from the engine. */
export function SectionAtX({ model, shape, material, units }: SectionAtXProps) {
  const analysis = useMemo(() => {
    try {
      return { ok: true as const, value: analyze(model) };
    } catch (error) {
      if (error instanceof SolverError) return { ok: false as const, message: error.message };
      throw error;
    }
  }, [model]);
  const ids = [...model.loadCases.map((c) => c.id), ...(model.combinations ?? []).map((c) => c.id)];
  const x0 = model.nodes[0]?.x ?? 0;
  const xEnd = model.nodes[model.nodes.length - 1]?.x ?? 0;
  const [id, setId] = useState(() => (model.combinations?.[0]?.id ?? ids[0] ?? ""));
  const [xText, setXText] = useState(() => editableDesign((x0 + xEnd) / 2, units, "length"));

  if (!analysis.ok) return <Alert tone="error" title="The beam could not be solved">{analysis.message}</Alert>;
  const typed = Number(xText);
  const x = Number.isFinite(typed) ? Math.min(Math.max(fromDesignDisplay(typed, units, "length"), x0), xEnd) : x0;
  const values = valuesAt(analysis.value, id, x);
  const theory = model.theory ?? "euler-bernoulli";

  return (
    <div className="space-y-3">
      <div className="grid gap-3 md:grid-cols-3">
        <SelectField label="Case or combination" name="section-case" value={id} options={ids.map((i) => ({ value: i, label: i }))} onChange={(e) => setId(e.target.value)} />
        <TextField label={`x (${designUnit(units, "length")})`} name="section-x" inputMode="decimal" value={xText} onChange={(e) => setXText(e.target.value)} />
        <label className="text-sm">
          <span className="mb-1 block font-medium text-ink-800">Position along the beam</span>
          <input
            type="range"
            className="w-full"
            aria-label="Position along the beam"
            min={x0}
            max={xEnd}
            step={(xEnd - x0) / 200 || 1}
            value={x}
            onChange={(e) => setXText(editableDesign(Number(e.target.value), units, "length"))}
          />
        </label>
      </div>
      {values ? (
        <SectionView shape={shape} E={material.E} {...(material.G !== undefined ? { G: material.G } : {})} M={values.M} V={values.V} rz={values.rz} theory={theory} units={units} x={x} />
      ) : (
        <p className="text-sm text-paper-600">Choose a load case or combination.</p>
      )}
    </div>
  );
}
