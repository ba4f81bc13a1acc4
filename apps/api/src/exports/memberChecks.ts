import { solve } from "@spanwright/solver";
import {
  DEFLECTION_LIMIT_PRESETS,
  assembleBeamChecks,
  bracePointsEvery,
  checkStationsForSpans,
  propertiesOfValidShape,
  stationsFromResult,
  type DesignMethod,
  type Material,
  type SectionShape,
  type SpanRef,
} from "@spanwright/solver/design";
import { listSpans, type BeamModel, type ReportCheckRow } from "@spanwright/handoff";

export interface CheckedSection {
  readonly name: string;
  readonly shape: SectionShape;
  readonly material: Material;
}

export interface MemberChecks {
  readonly rows: ReportCheckRow[];
  /** One sentence naming the section, the material and the assumptions, printed above the table. */
  readonly basis: string;
}

/** Id of the unfactored dead + live combination added for the total-deflection limit. */
export const SERVICE_COMBINATION_ID = "service D+L";

const preset = (id: string) => {
  const p = DEFLECTION_LIMIT_PRESETS.find((d) => d.id === id);
  if (!p) throw new Error(`missing deflection preset ${id}`);
  return { kind: "preset" as const, preset: p };
};

/**
 * Elastic allowables when the material gives Fy: 0.6·Fy in bending and 0.4·Fy in shear, the
 * classic allowable-stress values (common practice). Against factored combinations they are
 * conservative; the basis sentence says so.
 */
const BENDING_ALLOWABLE_OF_FY = 0.6;
const SHEAR_ALLOWABLE_OF_FY = 0.4;

/**
 * The report's member checks for one project section on a beam: spans from the supports, braced
 * at the supports and every `Lb` metres from the start of each span (null: at the supports only,
 * Lb = span); strength from the model's combinations (or its load cases when
 * it has none), all pattern pieces loaded; deflection L/360 for each live case and L/240 for the
 * unfactored sum of dead and live cases (IBC floor presets). A doubly symmetric I-shape is checked
 * by AISC 360-22 F2 and G2; any other shape elastically against 0.6·Fy and 0.4·Fy when Fy is known.
 */
export function memberChecks(model: BeamModel, section: CheckedSection, method: DesignMethod, Lb: number | null = null): MemberChecks {
  const spans: SpanRef[] = listSpans(model).map((s, i, all) => ({
    label: String(s.number),
    x1: s.x1,
    x2: s.x2,
    kind: s.overhang ? "cantilever" : "span",
    ...(s.overhang ? { supportAt: i === 0 && all.length > 1 ? ("right" as const) : ("left" as const) } : {}),
  }));
  const dead = model.loadCases.filter((c) => c.category === "dead").map((c) => c.id);
  const live = model.loadCases.filter((c) => c.category === "live").map((c) => c.id);
  const service = dead.length > 0 && live.length > 0 ? [{ id: SERVICE_COMBINATION_ID, factors: Object.fromEntries([...dead, ...live].map((id) => [id, 1])) }] : [];
  const braces = bracePointsEvery(spans, Lb);
  const solved = solve({ ...model, combinations: [...model.combinations, ...service], stations: checkStationsForSpans(spans, Lb) });
  const at = (id: string) => stationsFromResult(solved, id);

  const strengthIds = model.combinations.length > 0 ? model.combinations.map((c) => c.id) : model.loadCases.filter((c) => c.category !== "settlement").map((c) => c.id);
  const strength = strengthIds.map((id) => ({ id, stations: at(id) }));
  const deflection = [
    ...live.map((id) => ({ id, stations: at(id), limit: preset("floor-live") })),
    ...service.map((c) => ({ id: c.id, stations: at(c.id), limit: preset("floor-total") })),
  ];

  const { shape, material } = section;
  const props = propertiesOfValidShape(shape);
  const Fy = material.Fy;
  const mpa = (pa: number) => `${Number((pa / 1e6).toPrecision(4))} MPa`;
  const describe = `${section.name} (${shape.kind}, depth ${Number((props.depth * 1000).toPrecision(4))} mm), ${material.name}, E = ${Number((material.E / 1e9).toPrecision(4))} GPa${Fy ? `, Fy = ${mpa(Fy)}` : ""}`;
  const cases = model.combinations.length > 0 ? `combinations taken as ${method} load combinations` : "unfactored load cases (the model has no combinations)";
  const bracing = Lb === null ? "braced at the supports only (Lb = span)" : `braced at the supports and every Lb = ${Number(Lb.toPrecision(4))} m from the start of each span`;
  const common = `${cases}, all pattern pieces loaded; compression flange ${bracing}`;

  const { basis, rows } = assembleBeamChecks({
    shape,
    material,
    method,
    spans,
    bracePoints: braces,
    strength,
    deflection,
    allowableBending: Fy === undefined ? null : BENDING_ALLOWABLE_OF_FY * Fy,
    allowableShear: Fy === undefined ? null : SHEAR_ALLOWABLE_OF_FY * Fy,
  });
  const assumptions =
    basis === "aisc-360-22"
      ? `AISC 360-22 ${method}; ${common}`
      : Fy !== undefined
        ? `elastic stresses against 0.6·Fy in bending and 0.4·Fy in shear (common practice; conservative under factored combinations); ${common}`
        : "the material gives no Fy, so only deflections are checked";
  return { rows: rows.map(({ span, caseId, check }) => ({ span, caseId, check })), basis: `${describe}; ${assumptions}` };
}
