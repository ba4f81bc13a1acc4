import { useState, type FormEvent } from "react";
import { validateMaterial, validateSectionShape, type Material, type SectionShape } from "@spanwright/solver/design";
import type { ProjectSection } from "@spanwright/contracts";
import { useCreateSection, useSections } from "../../api/sections";
import { describeError } from "../../api/client";
import { Button } from "../../components/Button";
import { SelectField } from "../../components/SelectField";
import { TextField } from "../../components/TextField";
import { SHAPE_LABELS } from "../../design/shapeFields";

export interface ProjectSectionLibraryProps {
  readonly projectId: string;
  /** The shape and material typed in the dialog now, for "Save to project library". */
  readonly shape: SectionShape;
  readonly material: Material;
  /** Engineers and owners may add to the library; everyone may pick from it. */
  readonly canSave: boolean;
  readonly onPick: (shape: SectionShape, material: Material) => void;
}

export type PickedSection = { readonly ok: true; readonly shape: SectionShape; readonly material: Material } | { readonly ok: false; readonly message: string };

/**
 * The server stores shape and material as plain objects (contracts do not depend on the engine),
 * so a picked section is checked again with the engine's own validators before it fills the dialog.
 */
export function readProjectSection(section: ProjectSection): PickedSection {
  const shape = validateSectionShape(section.shape);
  if (!shape.ok) return { ok: false, message: `“${section.name}” has a shape this editor cannot read: ${shape.error.message}` };
  const material = validateMaterial(section.material);
  if (!material.ok) return { ok: false, message: `“${section.name}” has a material this editor cannot read: ${material.error.message}` };
  return { ok: true, shape: shape.value, material: material.value };
}

/** Pick a saved project section to fill the dialog, or save the typed one under a name. */
export function ProjectSectionLibrary({ projectId, shape, material, canSave, onPick }: ProjectSectionLibraryProps) {
  const sections = useSections(projectId);
  const create = useCreateSection(projectId);
  const [picked, setPicked] = useState("");
  const [problem, setProblem] = useState<string | null>(null);
  const [name, setName] = useState("");
  const [saved, setSaved] = useState<string | null>(null);

  const pick = (id: string) => {
    setPicked(id);
    setProblem(null);
    const section = sections.data?.find((s) => s.id === id);
    if (!section) return;
    const r = readProjectSection(section);
    if (r.ok) onPick(r.shape, r.material);
    else setProblem(r.message);
  };

  const save = (e: FormEvent) => {
    e.preventDefault();
    setSaved(null);
    const trimmed = name.trim();
    if (!trimmed) return;
    create.mutate(
      { name: trimmed, shape: { ...shape }, material: { ...material } },
      {
        onSuccess: (section) => {
          setSaved(section.name);
          setName("");
        },
      },
    );
  };

  const list = sections.data ?? [];
  const options = [
    { value: "", label: sections.isPending ? "Loading…" : list.length === 0 ? "No saved sections yet" : "Choose a saved section…" },
    ...list.map((s) => ({ value: s.id, label: `${s.name} (${SHAPE_LABELS[s.shape.kind as SectionShape["kind"]] ?? String(s.shape.kind)}, ${String(s.material.name ?? "")})` })),
  ];

  return (
    <section aria-label="Project section library" className="space-y-3 rounded-md border border-paper-300 bg-paper-50 p-3">
      <SelectField
        label="Saved project sections"
        name="project-section"
        options={options}
        value={picked}
        disabled={sections.isPending || list.length === 0}
        onChange={(e) => pick(e.target.value)}
        error={sections.isError ? `Could not load the project's sections: ${describeError(sections.error)}` : (problem ?? undefined)}
      />
      {canSave && (
        <form onSubmit={save} className="flex flex-wrap items-end gap-2">
          <TextField label="Name in the project library" name="section-name" value={name} onChange={(e) => setName(e.target.value)} maxLength={120} className="min-w-48 flex-1" />
          <Button type="submit" variant="secondary" disabled={name.trim() === ""} busy={create.isPending} busyLabel="Saving…">
            Save to project library
          </Button>
        </form>
      )}
      {saved && <p role="status" className="text-sm text-paper-700">Saved “{saved}” to the project library.</p>}
      {create.isError && <p role="alert" className="text-sm font-medium text-danger-700">Not saved to the library: {describeError(create.error)}</p>}
    </section>
  );
}
