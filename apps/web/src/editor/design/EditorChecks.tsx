import { useCallback, useMemo, useState, type ReactNode } from "react";
import { useParams } from "react-router";
import type { Analysis } from "@spanwright/solver";
import type { Material, ResultLike, SectionShape } from "@spanwright/solver/design";
import { can, type BeamDesignSettings, type ProjectSection } from "@spanwright/contracts";
import { useBeam } from "../../api/beams";
import { useProject } from "../../api/projects";
import { useSections } from "../../api/sections";
import { ChecksPanel, stationsForChecks } from "../../design";
import { carryChoices, choicesFromSettings, sameValue, settingsOf } from "../../design/checkChoices";
import type { DesignModel } from "../../design/designModel";
import { BeamDesignSettingsBar } from "../../design/DesignSettingsBar";
import { materialToSave, sectionChoiceOf, startingSection, type SectionSource } from "../../design/SectionSourcePicker";
import type { BeamDocument } from "../model/BeamDocument";
import { toExchange } from "../model/exchange";
import { resultAtStations, resultIds } from "../results/checkResult";
import type { SegmentId } from "../model/ids";
import { beamSection } from "./beamSection";

export interface EditorChecksProps {
  readonly doc: BeamDocument;
  readonly analysis: Analysis;
  /** The selected segment, whose section is checked if it has one. */
  readonly segmentId?: SegmentId | null;
}

/** What every variant of the tab hands the checks panel: the open beam, read from the worker's analysis. */
interface BeamInputs {
  readonly doc: BeamDocument;
  readonly segmentId: SegmentId | null;
  readonly model: DesignModel;
  readonly result: ResultLike;
  readonly readStations: (asked: unknown) => ResultLike;
  /** Case and combination ids: the panel starts again when they change. */
  readonly ids: readonly string[];
}

/**
 * The member checks on the open beam, fed by the worker's analysis: the stations the checks need
 * (span ends, braces, quarter points) are read from it, so the editor never solves on the main
 * thread. On a saved beam's route the choices start from the beam's saved design settings and
 * engineers and owners save them (as on the design page); elsewhere they live with the tab.
 */
export function EditorChecks({ doc, analysis, segmentId = null }: EditorChecksProps) {
  const { projectId, beamId } = useParams();
  const { nodes, segments, loadCases, combinations, theory, stations } = doc;
  const model = useMemo(
    () => toExchange({ title: "", units: "si", nodes, segments, loadCases, combinations, theory, stations }),
    [nodes, segments, loadCases, combinations, theory, stations],
  );
  const ids = useMemo(() => resultIds(analysis), [analysis]);
  const result = useMemo(() => resultAtStations(analysis, ids, stationsForChecks(model, null)), [analysis, ids, model]);
  // Asked for when the user sets Lb and the checks need brace and quarter points the result lacks.
  const readStations = useCallback(
    (asked: unknown): ResultLike => resultAtStations(analysis, ids, (asked as { stations?: readonly number[] }).stations ?? []),
    [analysis, ids],
  );
  const inputs: BeamInputs = { doc, segmentId, model, result, readStations, ids };
  if (projectId && beamId) return <SavedBeamChecks projectId={projectId} beamId={beamId} inputs={inputs} />;
  const chosen = beamSection(doc, segmentId);
  if (!chosen) return <NoSection />;
  return (
    <ChecksBody note={`Checking the section of segment ${chosen.index + 1}: ${chosen.section.material.name}.`}>
      <ChecksPanel key={ids.join("\u0000")} model={model} result={result} units={doc.units} shape={chosen.section.shape} material={chosen.section.material} solveModel={readStations} />
    </ChecksBody>
  );
}

function SavedBeamChecks({ projectId, beamId, inputs }: { projectId: string; beamId: string; inputs: BeamInputs }) {
  const beam = useBeam(projectId, beamId);
  const project = useProject(projectId);
  const sections = useSections(projectId);
  if (beam.isPending || project.isPending || sections.isPending) return <p className="p-3 text-sm text-paper-600">Loading the beam's design settings…</p>;
  if (beam.isError) return <p className="p-3 text-sm text-danger-700">The beam's design settings could not be loaded: {beam.error.message}</p>;
  return (
    <SavedSettingsChecks
      ids={{ projectId, beamId, version: beam.data.revision.version }}
      inputs={inputs}
      saved={beam.data.designSettings ?? null}
      sections={sections.data ?? []}
      canEdit={project.data ? can(project.data.role, "edit") : false}
    />
  );
}

interface SavedSettingsChecksProps {
  readonly ids: { readonly projectId: string; readonly beamId: string; readonly version: number };
  readonly inputs: BeamInputs;
  readonly saved: BeamDesignSettings | null;
  readonly sections: readonly ProjectSection[];
  readonly canEdit: boolean;
}

function SavedSettingsChecks({ ids, inputs, saved, sections, canEdit }: SavedSettingsChecksProps) {
  const { doc, model } = inputs;
  // The choices and the model they were made on, so a change of cases or combinations can carry them over.
  const [made, setMade] = useState(() => ({ choices: choicesFromSettings(saved, model), model }));
  const checked = checkedSection(doc, inputs.segmentId, saved, sections);
  if (!checked) return <NoSection missingSaved={saved?.section?.source === "project"} />;
  const draft = settingsOf(sectionChoiceOf(checked.source, checked.shape), materialToSave(checked.source, checked.material, sections), made.choices, model);
  return (
    <ChecksBody note={checked.note}>
      <ChecksPanel
        key={inputs.ids.join("\u0000")}
        model={model}
        result={inputs.result}
        units={doc.units}
        shape={checked.shape}
        material={checked.material}
        solveModel={inputs.readStations}
        initial={carryChoices(made.choices, made.model, model)}
        onChoicesChange={(choices) => setMade({ choices, model })}
        readOnly={!canEdit}
        footer={
          <div className="space-y-1">
            <BeamDesignSettingsBar ids={ids} draft={draft} saved={saved} canEdit={canEdit} />
            {saved !== null && (
              <p className="text-xs text-paper-600">The report prints revision {ids.version}, the last one saved; edits not yet saved in the editor are not in it.</p>
            )}
          </div>
        }
      />
    </ChecksBody>
  );
}

interface CheckedSection {
  readonly shape: SectionShape;
  readonly material: Material;
  /** How the section is saved: the saved choice while it is the one checked, else typed under the segment's name. */
  readonly source: SectionSource;
  readonly note: string;
}

/**
 * The section checked: the selected (or first) segment's, else the beam's saved one. The editor's
 * segment sections last one session, so after a reload the saved section is what is left. A saved
 * project section since deleted from the project gives none.
 */
function checkedSection(doc: BeamDocument, segmentId: SegmentId | null, saved: BeamDesignSettings | null, sections: readonly ProjectSection[]): CheckedSection | null {
  const choice = saved?.section ?? null;
  const savedSection = choice && (choice.source === "typed" || sections.some((s) => s.id === choice.sectionId)) ? startingSection(saved, sections) : null;
  const segment = beamSection(doc, segmentId);
  if (segment) {
    const { shape, material } = segment.section;
    const name = `Section of segment ${segment.index + 1}`;
    const source: SectionSource = savedSection && sameValue(savedSection.shape, shape) ? savedSection.source : { kind: "typed", name };
    return { shape, material, source, note: `Checking the section of segment ${segment.index + 1}: ${material.name}.` };
  }
  if (!savedSection) return null;
  const { source, shape, material } = savedSection;
  const name = source.kind === "typed" ? source.name : (sections.find((s) => s.id === source.sectionId)?.name ?? "");
  return { shape, material, source, note: `Checking the section saved with the beam, ${name}: ${material.name} (no segment has a section in this session).` };
}

function ChecksBody({ note, children }: { note: string; children: ReactNode }) {
  return (
    <div className="space-y-2 p-3">
      <p className="text-xs text-paper-600">{note}</p>
      {children}
    </div>
  );
}

function NoSection({ missingSaved = false }: { missingSaved?: boolean }) {
  return (
    <p className="p-3 text-sm text-paper-700">
      {missingSaved ? "The project section saved with this beam's design settings has been deleted. " : ""}
      Choose a section and material for the beam first: “Section…” in the Segments table or the segment inspector.
    </p>
  );
}
