import { solve } from "@spanwright/solver";
import {
  DEFLECTION_LIMIT_PRESETS,
  assembleBeamChecks,
  bracePointsEvery,
  checkStationsForSpans,
  propertiesOfValidShape,
  stationsFromResult,
  type BeamCheckBasis,
  type CbRule,
  type DeflectionLimit,
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

/** A deflection limit and the load cases or combinations it applies to. */
export interface DeflectionRuleChoice {
  readonly limit: DeflectionLimit;
  readonly ids: readonly string[];
}

/** How the checks read the model; everything but `method` has the report's long-standing default. */
export interface MemberCheckOptions {
  readonly method: DesignMethod;
  /** Brace spacing of the compression flange from each span's start, m; null (default): at the supports only. */
  readonly Lb?: number | null;
  readonly cb?: CbRule;
  /** Cases or combinations for the strength checks; null (default): every combination, or the load cases when there are none. */
  readonly strengthIds?: readonly string[] | null;
  /** Deflection limits; null (default): L/360 for each live case and L/240 for the unfactored dead + live sum (IBC floor presets). */
  readonly deflection?: readonly DeflectionRuleChoice[] | null;
  /** Allowables of the elastic checks, Pa; null (default): 0.6·Fy and 0.4·Fy when the material gives Fy. */
  readonly allowableBending?: number | null;
  readonly allowableShear?: number | null;
}

function limitText(limit: DeflectionLimit): string {
  switch (limit.kind) {
    case "preset":
      return `L/${limit.preset.ratio}`;
    case "ratio":
      return `L/${limit.ratio}`;
    case "absolute":
      return `${Number((limit.value * 1000).toPrecision(4))} mm`;
    default:
      return ((never: never) => never)(limit);
  }
}

const Pa = (pa: number) => `${Number((pa / 1e6).toPrecision(4))} MPa`;

/** The report's spans, numbered as in its other tables; an overhang is supported at its inner end. */
function reportSpans(model: BeamModel): SpanRef[] {
  return listSpans(model).map((s, i, all) => ({
    label: String(s.number),
    x1: s.x1,
    x2: s.x2,
    kind: s.overhang ? "cantilever" : "span",
    ...(s.overhang ? { supportAt: i === 0 && all.length > 1 ? ("right" as const) : ("left" as const) } : {}),
  }));
}

interface BasisFacts {
  readonly model: BeamModel;
  readonly section: CheckedSection;
  readonly options: MemberCheckOptions;
  readonly checkedBy: BeamCheckBasis;
  readonly known: ReadonlySet<string>;
  readonly missing: ReadonlySet<string>;
  readonly allowableBending: number | null;
  readonly allowableShear: number | null;
}

/** The sentence printed above the table: section, material, and every assumption the rows rest on. */
function basisSentence(f: BasisFacts): string {
  const { model, section, options } = f;
  const { shape, material } = section;
  const Fy = material.Fy;
  const Lb = options.Lb ?? null;
  const rules = options.deflection ?? null;
  const depth = propertiesOfValidShape(shape).depth;
  const describe = `${section.name} (${shape.kind}, depth ${Number((depth * 1000).toPrecision(4))} mm), ${material.name}, E = ${Number((material.E / 1e9).toPrecision(4))} GPa${Fy ? `, Fy = ${Pa(Fy)}` : ""}`;
  const cases = model.combinations.length > 0 ? `combinations taken as ${options.method} load combinations` : "unfactored load cases (the model has no combinations)";
  const bracing = Lb === null ? "braced at the supports only (Lb = span)" : `braced at the supports and every Lb = ${Number(Lb.toPrecision(4))} m from the start of each span`;
  const limits =
    rules === null
      ? "deflection L/360 under each live case and L/240 under unfactored dead + live (IBC floor members)"
      : rules.length === 0
        ? "no deflection limits chosen"
        : `deflection ${rules.map((r) => `${limitText(r.limit)} for ${r.ids.filter((id) => f.known.has(id)).join(", ") || "nothing"}`).join("; ")}`;
  const skipped = f.missing.size > 0 ? `; not in this revision, so not checked: ${[...f.missing].join(", ")}` : "";
  const common = `${cases}, all pattern pieces loaded; compression flange ${bracing}; ${limits}${skipped}`;
  if (f.checkedBy === "aisc-360-22") return `${describe}; AISC 360-22 ${options.method}${options.cb === "unity" ? ", Cb taken as 1.0" : ""}; ${common}`;
  const chosen = [f.allowableBending !== null ? `bending ${Pa(f.allowableBending)}` : "", f.allowableShear !== null ? `shear ${Pa(f.allowableShear)}` : ""].filter(Boolean).join(", ");
  const elastic =
    f.allowableBending === null && f.allowableShear === null
      ? `no allowable stress${Fy === undefined ? " and no Fy in the material" : ""}, so only deflections are checked`
      : options.allowableBending != null || options.allowableShear != null
        ? `elastic stresses against the allowables chosen (${chosen})`
        : "elastic stresses against 0.6·Fy in bending and 0.4·Fy in shear (common practice; conservative under factored combinations)";
  return `${describe}; ${elastic}; ${common}`;
}

/**
 * The report's member checks for one section on a beam (`assembleBeamChecks`, as the Checks tab):
 * spans from the supports, braced at the supports and every `Lb` metres from the start of each
 * span; strength from the chosen cases or combinations, all pattern pieces loaded; deflection
 * limits as chosen. A doubly symmetric I-shape is checked by AISC 360-22 F2 and G2; any other
 * shape elastically against the allowables (0.6·Fy and 0.4·Fy unless given). Chosen ids the
 * model lacks (settings saved against another revision) are left out and named in the basis.
 */
export function memberChecks(model: BeamModel, section: CheckedSection, options: MemberCheckOptions): MemberChecks {
  const Lb = options.Lb ?? null;
  const spans = reportSpans(model);
  const known = new Set([...model.loadCases.map((c) => c.id), ...model.combinations.map((c) => c.id)]);
  const dead = model.loadCases.filter((c) => c.category === "dead").map((c) => c.id);
  const live = model.loadCases.filter((c) => c.category === "live").map((c) => c.id);
  const rules = options.deflection ?? null;
  const service = rules === null && dead.length > 0 && live.length > 0 ? [{ id: SERVICE_COMBINATION_ID, factors: Object.fromEntries([...dead, ...live].map((id) => [id, 1])) }] : [];
  const solved = solve({ ...model, combinations: [...model.combinations, ...service], stations: checkStationsForSpans(spans, Lb) });
  const at = (id: string) => stationsFromResult(solved, id);

  const defaultStrength = model.combinations.length > 0 ? model.combinations.map((c) => c.id) : model.loadCases.filter((c) => c.category !== "settlement").map((c) => c.id);
  const chosenStrength = options.strengthIds ?? defaultStrength;
  const missing = new Set([...chosenStrength, ...(rules ?? []).flatMap((r) => r.ids)].filter((id) => !known.has(id)));
  const deflection =
    rules === null
      ? [
          ...live.map((id) => ({ id, stations: at(id), limit: preset("floor-live") })),
          ...service.map((c) => ({ id: c.id, stations: at(c.id), limit: preset("floor-total") })),
        ]
      : rules.flatMap((r) => r.ids.filter((id) => known.has(id)).map((id) => ({ id, stations: at(id), limit: r.limit })));
  const Fy = section.material.Fy;
  const allowableBending = options.allowableBending ?? (Fy === undefined ? null : BENDING_ALLOWABLE_OF_FY * Fy);
  const allowableShear = options.allowableShear ?? (Fy === undefined ? null : SHEAR_ALLOWABLE_OF_FY * Fy);
  const { basis, rows } = assembleBeamChecks({
    shape: section.shape,
    material: section.material,
    method: options.method,
    spans,
    bracePoints: bracePointsEvery(spans, Lb),
    strength: chosenStrength.filter((id) => known.has(id)).map((id) => ({ id, stations: at(id) })),
    deflection,
    allowableBending,
    allowableShear,
    ...(options.cb ? { cb: options.cb } : {}),
  });
  return {
    rows: rows.map(({ span, caseId, check }) => ({ span, caseId, check })),
    basis: basisSentence({ model, section, options, checkedBy: basis, known, missing, allowableBending, allowableShear }),
  };
}
