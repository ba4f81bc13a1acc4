import { useMemo, useState } from "react";
import {
  sectionProperties,
  segmentStiffness,
  type DesignError,
  type Material,
  type SectionKind,
  type SectionProperties,
  type SectionShape,
  type SegmentStiffness,
} from "@spanwright/solver/design";
import { SelectField } from "../components/SelectField";
import { TextField } from "../components/TextField";
import type { UnitSystemId } from "../editor/units/unitSystems";
import type { Theory } from "../editor/model/BeamDocument";
import { designUnit } from "./designUnits";
import { SectionPropertiesTable } from "./SectionPropertiesTable";
import { convertFieldText, DEFAULT_SHAPES, fieldTextOf, SECTION_KINDS, SHAPE_FIELDS, SHAPE_LABELS, shapeInputOf, type FieldText } from "./shapeFields";

/** What the editor emits whenever the typed section is valid. */
export interface SectionChange {
  readonly shape: SectionShape;
  readonly properties: SectionProperties;
  /** The segment fields (SI) when a material is given; an error when theory needs what is missing. */
  readonly segment: { readonly ok: true; readonly value: SegmentStiffness } | { readonly ok: false; readonly error: DesignError } | null;
}

export interface SectionEditorProps {
  /** Starting shape (SI); later changes of this prop are ignored (the editor owns the text). */
  readonly initialShape?: SectionShape;
  readonly units: UnitSystemId;
  /** With a material, `onChange` also carries the segment fields E, I (and A, G, shearFactor). */
  readonly material?: Material;
  readonly theory?: Theory;
  /** Offer only these shapes (e.g. ["i-shape"] for the steel checks). */
  readonly kinds?: readonly SectionKind[];
  readonly onChange?: (change: SectionChange) => void;
}

/** Pick a parametric shape or type a custom one; properties come from the engine's `sectionProperties`. */
export function SectionEditor({ initialShape, units, material, theory = "euler-bernoulli", kinds = SECTION_KINDS, onChange }: SectionEditorProps) {
  const start = initialShape ?? DEFAULT_SHAPES[kinds[0] ?? "rectangle"];
  const [kind, setKind] = useState<SectionKind>(start.kind);
  const [orientation, setOrientation] = useState(start.kind === "tee" ? start.orientation : "flange-top");
  const [text, setText] = useState<FieldText>(() => fieldTextOf(start, units));
  const [textUnits, setTextUnits] = useState(units);
  if (textUnits !== units) {
    // The typed text is in the old display units: carry the values over (React's "adjust state on prop change").
    setTextUnits(units);
    setText(convertFieldText(kind, text, textUnits, units));
  }

  const computed = useMemo(() => sectionProperties(shapeInputOf(kind, text, units, orientation)), [kind, text, units, orientation]);

  const emit = (nextKind: SectionKind, nextText: FieldText, nextOrientation: string) => {
    if (!onChange) return;
    const input = shapeInputOf(nextKind, nextText, units, nextOrientation);
    const result = sectionProperties(input);
    if (!result.ok) return;
    const segment = material ? segmentStiffness(result.value, material, theory) : null;
    onChange({ shape: input as SectionShape, properties: result.value, segment });
  };

  const changeKind = (next: SectionKind) => {
    const nextText = fieldTextOf(DEFAULT_SHAPES[next], units);
    setKind(next);
    setText(nextText);
    emit(next, nextText, orientation);
  };
  const changeField = (key: string, value: string) => {
    const nextText = { ...text, [key]: value };
    setText(nextText);
    emit(kind, nextText, orientation);
  };

  const fieldError = computed.ok ? undefined : computed.error;
  const segment = computed.ok && material ? segmentStiffness(computed.value, material, theory) : null;

  return (
    <div className="grid gap-4 md:grid-cols-2">
      <div className="space-y-3">
        <SelectField
          label="Shape"
          name="section-kind"
          value={kind}
          options={kinds.map((k) => ({ value: k, label: SHAPE_LABELS[k] }))}
          onChange={(e) => changeKind(e.target.value as SectionKind)}
        />
        {kind === "tee" && (
          <SelectField
            label="Flange"
            name="tee-orientation"
            value={orientation}
            options={[
              { value: "flange-top", label: "Flange on top" },
              { value: "flange-bottom", label: "Flange at the bottom (inverted tee)" },
            ]}
            onChange={(e) => {
              const next = e.target.value as "flange-top" | "flange-bottom";
              setOrientation(next);
              emit(kind, text, next);
            }}
          />
        )}
        <div className="grid grid-cols-2 gap-3">
          {SHAPE_FIELDS[kind].map((f) => (
            <TextField
              key={`${kind}-${f.key}`}
              label={`${f.label} (${designUnit(units, f.quantity)})`}
              name={f.key}
              inputMode="decimal"
              value={text[f.key] ?? ""}
              placeholder={f.optional ? "optional" : undefined}
              error={fieldError?.field === f.key ? fieldError.message : undefined}
              onChange={(e) => changeField(f.key, e.target.value)}
            />
          ))}
        </div>
        {fieldError && !SHAPE_FIELDS[kind].some((f) => f.key === fieldError.field) && (
          <p className="text-sm font-medium text-danger-700">{fieldError.message}</p>
        )}
        {segment && !segment.ok && <p className="text-sm text-caution-700">{segment.error.message}</p>}
        {kind !== "custom" && kind !== "rectangle" && kind !== "circle" && (
          <p className="text-xs text-paper-600">Plates only: root fillets and corner radii are ignored, so A and I come out slightly below rolled-section tables.</p>
        )}
      </div>
      <div>{computed.ok ? <SectionPropertiesTable properties={computed.value} units={units} /> : <p className="text-sm text-paper-600">Fix the highlighted field to see the properties.</p>}</div>
    </div>
  );
}
