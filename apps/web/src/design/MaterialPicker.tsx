import { useState } from "react";
import { createCustomMaterial, MATERIAL_PRESETS, type Material, type MaterialKind } from "@spanwright/solver/design";
import { SelectField } from "../components/SelectField";
import { TextField } from "../components/TextField";
import type { UnitSystemId } from "../editor/units/unitSystems";
import { designUnit, editableDesign, formatDesign, fromDesignDisplay } from "./designUnits";

export interface MaterialPickerProps {
  readonly units: UnitSystemId;
  /** Starting material; a preset is copied so editing never changes the template. */
  readonly initial?: Material;
  /** Offer only presets of these kinds (e.g. ["steel"] for the AISC checks); custom is always offered. */
  readonly kinds?: readonly MaterialKind[];
  readonly onChange?: (material: Material) => void;
}

const CUSTOM = "custom";
type Field = "E" | "G" | "Fy";
const FIELDS: readonly { key: Field; label: string }[] = [
  { key: "E", label: "Modulus of elasticity E" },
  { key: "G", label: "Shear modulus G" },
  { key: "Fy", label: "Yield stress Fy" },
];

function textOf(m: Material, units: UnitSystemId): Record<Field, string> {
  const t = (v: number | undefined) => (v === undefined ? "" : editableDesign(v, units, "stress"));
  return { E: t(m.E), G: t(m.G), Fy: t(m.Fy) };
}

/**
 * Presets are templates: picking one copies its values into editable fields. Values stay marked
 * "typical, confirm for your project" until the user edits them, when they become the user's own.
 */
export function MaterialPicker({ units, initial, kinds, onChange }: MaterialPickerProps) {
  const presets = MATERIAL_PRESETS.filter((m) => !kinds || kinds.includes(m.kind));
  const first = initial ?? presets[0] ?? MATERIAL_PRESETS[0]!;
  const [base, setBase] = useState<Material>(first);
  const [choice, setChoice] = useState<string>(first.id);
  const [text, setText] = useState(() => textOf(first, units));
  const [textUnits, setTextUnits] = useState(units);
  if (textUnits !== units) {
    // Typed values are in the old display units: carry them over.
    const convert = (s: string) => (s.trim() === "" || !Number.isFinite(Number(s)) ? s : editableDesign(fromDesignDisplay(Number(s), textUnits, "stress"), units, "stress"));
    setTextUnits(units);
    setText({ E: convert(text.E), G: convert(text.G), Fy: convert(text.Fy) });
  }
  const [edited, setEdited] = useState(false);
  const [error, setError] = useState<{ field: string; message: string } | null>(null);

  const pick = (id: string) => {
    setChoice(id);
    const preset = presets.find((m) => m.id === id);
    const next = preset ?? { ...base, id: "custom", name: "Custom material", kind: "custom" as const, typical: false };
    setBase(next);
    setText(textOf(next, units));
    setEdited(id === CUSTOM);
    setError(null);
    if (preset) onChange?.(preset);
  };

  const edit = (key: Field, value: string) => {
    const nextText = { ...text, [key]: value };
    setText(nextText);
    setEdited(true);
    const num = (s: string) => (s.trim() === "" ? undefined : fromDesignDisplay(Number(s), units, "stress"));
    const E = num(nextText.E);
    const made = createCustomMaterial({
      id: `${base.id}-edited`,
      name: `${base.name} (edited)`,
      E: E ?? Number.NaN,
      ...(num(nextText.G) !== undefined ? { G: num(nextText.G) } : {}),
      ...(num(nextText.Fy) !== undefined ? { Fy: num(nextText.Fy) } : {}),
    });
    if (!made.ok) {
      setError(made.error);
      return;
    }
    setError(null);
    onChange?.({ ...made.value, kind: base.kind === "custom" ? "custom" : base.kind, source: `edited from: ${base.source}` });
  };

  return (
    <div className="space-y-3">
      <SelectField
        label="Material"
        name="material"
        value={choice}
        options={[...presets.map((m) => ({ value: m.id, label: m.name })), { value: CUSTOM, label: "Custom material" }]}
        onChange={(e) => pick(e.target.value)}
      />
      {!edited && base.typical && (
        <p className="rounded-md bg-caution-50 px-3 py-2 text-xs text-caution-700" role="note">
          <span className="font-semibold">Typical values, confirm for your project.</span> {base.source}
        </p>
      )}
      {edited && <p className="text-xs text-paper-600">Values entered by you{base.typical ? `, starting from ${base.name}` : ""}.</p>}
      <div className="grid grid-cols-3 gap-3">
        {FIELDS.map((f) => (
          <TextField
            key={f.key}
            label={`${f.label} (${designUnit(units, "stress")})`}
            name={`material-${f.key}`}
            inputMode="decimal"
            value={text[f.key]}
            placeholder="optional"
            error={error?.field === f.key ? error.message : undefined}
            onChange={(e) => edit(f.key, e.target.value)}
          />
        ))}
      </div>
      {base.fc !== undefined && !edited && <p className="text-xs text-paper-600">f′c = {formatDesign(base.fc, units, "stress")}</p>}
    </div>
  );
}
