import { useMemo, useState } from "react";
import { Link, useParams } from "react-router";
import { beamModelSchema, solve, type BeamModel } from "@spanwright/solver";
import {
  findMaterialPreset,
  MATERIAL_PRESETS,
  sectionProperties,
  type GeneratedCombination,
  type Material,
  type ResultLike,
  type SectionShape,
} from "@spanwright/solver/design";
import { useBeam } from "../api/beams";
import { useProject } from "../api/projects";
import { Alert } from "../components/Alert";
import { Card, PageHeader } from "../components/PageHeader";
import { Loading, QueryError } from "../components/QueryState";
import type { UnitSystemId } from "../editor/units/unitSystems";
import { ChecksPanel } from "./ChecksPanel";
import { CombinationGenerator } from "./CombinationGenerator";
import { MaterialPicker } from "./MaterialPicker";
import { SectionAtX } from "./SectionAtX";
import { SectionEditor } from "./SectionEditor";
import { DEFAULT_SHAPES } from "./shapeFields";
import { TheoryPanel } from "./TheoryPanel";

function isResultLike(value: unknown): value is ResultLike {
  return typeof value === "object" && value !== null && typeof (value as { results?: unknown }).results === "object";
}

/**
 * Route /projects/:projectId/beams/:beamId/design: the saved beam's latest revision with the
 * section, material, combinations and checks chosen here. Nothing on this page is saved yet.
 */
export function DesignPage() {
  const { projectId = "", beamId = "" } = useParams();
  const beam = useBeam(projectId, beamId);
  const project = useProject(projectId);
  if (beam.isPending || project.isPending) return <Loading label="Opening beam…" />;
  if (beam.isError) return <QueryError error={beam.error} title="Could not load the beam" onRetry={() => void beam.refetch()} />;
  const parsed = beamModelSchema.safeParse(beam.data.revision.model);
  const units: UnitSystemId = project.data?.unitSystem ?? "si";
  return (
    <div className="space-y-6">
      <Link to={`/projects/${projectId}/beams/${beamId}`} className="text-sm text-paper-600 hover:underline">
        ← Back to the beam
      </Link>
      <PageHeader title={`Design checks: ${beam.data.beam.name}`} eyebrow={`Revision ${beam.data.revision.version}`} />
      {parsed.success ? (
        <DesignWorkspace key={`${beamId}/${beam.data.revision.version}`} model={parsed.data} result={isResultLike(beam.data.revision.result) ? beam.data.revision.result : null} units={units} />
      ) : (
        <Alert tone="error" title="The saved model cannot be read">{parsed.error.issues[0]?.message ?? "invalid model"}</Alert>
      )}
    </div>
  );
}

function DesignWorkspace({ model, result, units }: { model: BeamModel; result: ResultLike | null; units: UnitSystemId }) {
  const [shape, setShape] = useState<SectionShape>(DEFAULT_SHAPES["i-shape"]);
  const [material, setMaterial] = useState<Material>(findMaterialPreset("steel-a992") ?? MATERIAL_PRESETS[0]!);
  const [added, setAdded] = useState<readonly GeneratedCombination[]>([]);
  const theory = model.theory ?? "euler-bernoulli";

  // Generated combinations join the saved ones on this page only; the editor's table keeps the beam's own.
  const designModel = useMemo<BeamModel>(
    () => ({ ...model, combinations: [...(model.combinations ?? []), ...added.map((c) => ({ id: c.id, factors: { ...c.factors } }))] }),
    [model, added],
  );
  const properties = sectionProperties(shape);
  const cases = useMemo(() => model.loadCases.map((c) => ({ id: c.id, category: c.category })), [model]);
  const takenIds = useMemo(() => (model.combinations ?? []).map((c) => c.id), [model]);

  return (
    <div className="space-y-6">
      <Card title="Section and material">
        <div className="space-y-6">
          <MaterialPicker units={units} initial={material} onChange={setMaterial} />
          <SectionEditor units={units} initialShape={shape} material={material} theory={theory} onChange={(c) => setShape(c.shape)} />
        </div>
      </Card>
      <Card title="Load combinations from a code preset">
        <CombinationGenerator cases={cases} takenIds={takenIds} onApply={setAdded} />
        {added.length > 0 && (
          <p className="mt-3 text-sm text-paper-700">
            {added.length} generated combinations are used by the checks below on this page; add them to the beam in the editor to keep them.
          </p>
        )}
      </Card>
      <Card title="Member checks">
        <ChecksPanel key={added.map((c) => c.id).join(",")} model={designModel} result={added.length > 0 ? null : result} units={units} shape={shape} material={material} solveModel={solve} />
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
