import { useMemo, useState } from "react";
import { Link, useParams } from "react-router";
import { beamModelSchema, solve, type BeamModel } from "@spanwright/solver";
import {
  sectionProperties,
  type GeneratedCombination,
  type Material,
  type ResultLike,
  type SectionShape,
} from "@spanwright/solver/design";
import type { BeamDesignSettings, ProjectSection } from "@spanwright/contracts";
import { useBeam } from "../api/beams";
import { useProject } from "../api/projects";
import { useSections } from "../api/sections";
import { Alert } from "../components/Alert";
import { Card, PageHeader } from "../components/PageHeader";
import { Loading, QueryError } from "../components/QueryState";
import type { UnitSystemId } from "../editor/units/unitSystems";
import { carryChoices, choicesFromSettings, settingsOf } from "./checkChoices";
import { ChecksPanel } from "./ChecksPanel";
import { CombinationGenerator } from "./CombinationGenerator";
import { BeamDesignSettingsBar } from "./DesignSettingsBar";
import { MaterialPicker } from "./MaterialPicker";
import { SectionAtX } from "./SectionAtX";
import { SectionEditor } from "./SectionEditor";
import { materialToSave, sectionChoiceOf, SectionSourcePicker, startingSection, type SectionSource } from "./SectionSourcePicker";
import { TheoryPanel } from "./TheoryPanel";

function isResultLike(value: unknown): value is ResultLike {
  return typeof value === "object" && value !== null && typeof (value as { results?: unknown }).results === "object";
}

/**
 * Route /projects/:projectId/beams/:beamId/design: the saved beam's latest revision with the
 * section, material and check choices saved with the beam (engineers and owners save them; others
 * read them), the combinations generated here (kept on this page only) and the checks.
 */
export function DesignPage() {
  const { projectId = "", beamId = "" } = useParams();
  const beam = useBeam(projectId, beamId);
  const project = useProject(projectId);
  const sections = useSections(projectId);
  if (beam.isPending || project.isPending || sections.isPending) return <Loading label="Opening beam…" />;
  if (beam.isError) return <QueryError error={beam.error} title="Could not load the beam" onRetry={() => void beam.refetch()} />;
  const parsed = beamModelSchema.safeParse(beam.data.revision.model);
  const units: UnitSystemId = project.data?.unitSystem ?? "si";
  const role = project.data?.role;
  const version = beam.data.revision.version;
  return (
    <div className="space-y-6">
      <Link to={`/projects/${projectId}/beams/${beamId}`} className="text-sm text-paper-600 hover:underline">
        ← Back to the beam
      </Link>
      <PageHeader title={`Design checks: ${beam.data.beam.name}`} eyebrow={`Revision ${version}`} />
      {parsed.success ? (
        <DesignWorkspace
          key={`${beamId}/${version}`}
          ids={{ projectId, beamId, version }}
          model={parsed.data}
          result={isResultLike(beam.data.revision.result) ? beam.data.revision.result : null}
          units={units}
          saved={beam.data.designSettings ?? null}
          sections={sections.data ?? []}
          canEdit={role === "owner" || role === "engineer"}
        />
      ) : (
        <Alert tone="error" title="The saved model cannot be read">{parsed.error.issues[0]?.message ?? "invalid model"}</Alert>
      )}
    </div>
  );
}

interface DesignWorkspaceProps {
  readonly ids: { readonly projectId: string; readonly beamId: string; readonly version: number };
  readonly model: BeamModel;
  readonly result: ResultLike | null;
  readonly units: UnitSystemId;
  readonly saved: BeamDesignSettings | null;
  readonly sections: readonly ProjectSection[];
  readonly canEdit: boolean;
}

function DesignWorkspace({ ids, model, result, units, saved, sections, canEdit }: DesignWorkspaceProps) {
  const [start] = useState(() => startingSection(saved, sections));
  const [source, setSource] = useState<SectionSource>(start.source);
  const [shape, setShape] = useState<SectionShape>(start.shape);
  const [material, setMaterial] = useState<Material>(start.material);
  const [pickerKey, setPickerKey] = useState(0);
  const [added, setAdded] = useState<readonly GeneratedCombination[]>([]);
  // The choices and the model they were made on: generated combinations restart the checks, which carry them over.
  const [made, setMade] = useState(() => ({ choices: choicesFromSettings(saved, model), model }));
  const theory = model.theory ?? "euler-bernoulli";

  // Generated combinations join the saved ones on this page only; the editor's table keeps the beam's own.
  const designModel = useMemo<BeamModel>(
    () => ({ ...model, combinations: [...(model.combinations ?? []), ...added.map((c) => ({ id: c.id, factors: { ...c.factors } }))] }),
    [model, added],
  );
  const properties = sectionProperties(shape);
  const cases = useMemo(() => model.loadCases.map((c) => ({ id: c.id, category: c.category })), [model]);
  const takenIds = useMemo(() => (model.combinations ?? []).map((c) => c.id), [model]);

  const pickSource = (next: SectionSource) => {
    setSource(next);
    const section = next.kind === "project" ? sections.find((s) => s.id === next.sectionId) : undefined;
    if (section) {
      setShape(section.shape as SectionShape);
      setMaterial(section.material as Material);
      setPickerKey((k) => k + 1);
    }
  };
  const editShape = (next: SectionShape) => {
    setShape(next);
    // Editing a project section's dimensions checks a new shape typed here; the library entry stays as it is.
    if (source.kind === "project") setSource({ kind: "typed", name: `${sections.find((s) => s.id === source.sectionId)?.name ?? "Section"} (edited)` });
  };
  const choices = carryChoices(made.choices, made.model, designModel);
  const draft = settingsOf(sectionChoiceOf(source, shape), materialToSave(source, material, sections), choices, designModel);

  return (
    <div className="space-y-6">
      <fieldset disabled={!canEdit} className="min-w-0">
        <Card title="Section and material">
          <div className="space-y-6">
            <SectionSourcePicker source={source} sections={sections} onChange={pickSource} />
            <MaterialPicker key={`m${pickerKey}`} units={units} initial={material} onChange={setMaterial} />
            <SectionEditor key={`s${pickerKey}`} units={units} initialShape={shape} material={material} theory={theory} onChange={(c) => editShape(c.shape)} />
          </div>
        </Card>
      </fieldset>
      <Card title="Load combinations from a code preset">
        <CombinationGenerator cases={cases} takenIds={takenIds} onApply={setAdded} />
        {added.length > 0 && (
          <p className="mt-3 text-sm text-paper-700">
            {added.length} generated combinations are used by the checks below on this page; add them to the beam in the editor to keep them.
          </p>
        )}
      </Card>
      <Card title="Member checks">
        <ChecksPanel
          key={added.map((c) => c.id).join(",")}
          model={designModel}
          result={added.length > 0 ? null : result}
          units={units}
          shape={shape}
          material={material}
          solveModel={solve}
          initial={choices}
          onChoicesChange={(next) => setMade({ choices: next, model: designModel })}
          readOnly={!canEdit}
          footer={
            <BeamDesignSettingsBar ids={ids} draft={draft} saved={saved} canEdit={canEdit} />
          }
        />
      </Card>
      <Card title="Section at x">
        <SectionAtX model={designModel} shape={shape} material={material} units={units} />
      </Card>
      <Card title="Beam theory and shear deformation">
        <TheoryPanel
          model={designModel}
          theory={theory}
          units={units}
          {...(properties.ok ? { depth: properties.value.depth } : {})}
          fallback={{ ...(material.G !== undefined ? { G: material.G } : {}), shearArea: properties.ok ? properties.value.shearArea : null }}
        />
      </Card>
    </div>
  );
}
