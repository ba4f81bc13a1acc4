import type { BeamDesignSettings, DesignSectionChoice, ProjectSection } from "@spanwright/contracts";
import { findMaterialPreset, MATERIAL_PRESETS, type Material, type SectionShape } from "@spanwright/solver/design";
import { SelectField } from "../components/SelectField";
import { TextField } from "../components/TextField";
import { sameValue } from "./checkChoices";
import { DEFAULT_SHAPES } from "./shapeFields";

/** Where the checked section comes from: a project section, or a shape typed on this page under a name. */
export type SectionSource = { readonly kind: "project"; readonly sectionId: string } | { readonly kind: "typed"; readonly name: string };

const TYPED = "typed";
const DEFAULT_TYPED_NAME = "Section typed for this beam";

/**
 * The section, material and source the page starts from: the saved ones when the beam has them
 * (a saved project section that was since deleted falls back to a typed default), else a steel
 * I-shape of A992 typed here.
 */
export function startingSection(saved: BeamDesignSettings | null, sections: readonly ProjectSection[]): { source: SectionSource; shape: SectionShape; material: Material } {
  const fallbackMaterial = findMaterialPreset("steel-a992") ?? MATERIAL_PRESETS[0]!;
  const choice = saved?.section ?? null;
  const savedMaterial = (saved?.material ?? null) as Material | null;
  if (choice?.source === "project") {
    const section = sections.find((s) => s.id === choice.sectionId);
    if (section) return { source: { kind: "project", sectionId: section.id }, shape: section.shape as SectionShape, material: savedMaterial ?? (section.material as Material) };
  }
  if (choice?.source === "typed") return { source: { kind: "typed", name: choice.name }, shape: choice.shape as SectionShape, material: savedMaterial ?? fallbackMaterial };
  return { source: { kind: "typed", name: DEFAULT_TYPED_NAME }, shape: DEFAULT_SHAPES["i-shape"], material: savedMaterial ?? fallbackMaterial };
}

export function sectionChoiceOf(source: SectionSource, shape: SectionShape): DesignSectionChoice {
  return source.kind === "project" ? { source: "project", sectionId: source.sectionId } : { source: "typed", name: source.name.trim() || DEFAULT_TYPED_NAME, shape: { ...shape } };
}

/** Null when a project section keeps its own material, so a later edit of the library entry applies. */
export function materialToSave(source: SectionSource, material: Material, sections: readonly ProjectSection[]): Material | null {
  const section = source.kind === "project" ? sections.find((s) => s.id === source.sectionId) : undefined;
  return section && sameValue(section.material, material) ? null : material;
}

/** Choose a project section from the library or type one here (named, so the report can print it). */
export function SectionSourcePicker({ source, sections, onChange }: { source: SectionSource; sections: readonly ProjectSection[]; onChange: (next: SectionSource) => void }) {
  return (
    <div className="grid gap-3 md:grid-cols-2">
      <SelectField
        label="Section checked"
        name="section-source"
        value={source.kind === "project" ? source.sectionId : TYPED}
        options={[{ value: TYPED, label: "Typed on this page" }, ...sections.map((s) => ({ value: s.id, label: `Project section: ${s.name}` }))]}
        onChange={(e) => onChange(e.target.value === TYPED ? { kind: "typed", name: DEFAULT_TYPED_NAME } : { kind: "project", sectionId: e.target.value })}
      />
      {source.kind === "typed" && (
        <TextField label="Name of the typed section" name="section-name" value={source.name} maxLength={120} onChange={(e) => onChange({ kind: "typed", name: e.target.value })} />
      )}
    </div>
  );
}
