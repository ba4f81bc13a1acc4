import { exhaustive } from "../result.js";
import { ASCE7_22_ALLOWABLE, ASCE7_22_STRENGTH, ASCE7_LIVE_EXCEPTION_NOTE } from "./asce7Presets.js";
import { LIVE_LOAD_REDUCTION_NOTE, type CombinationSet, type CombinationTemplate, type GeneratedCombination, type LoadCaseRef, type LoadCategory, type SkippedCase } from "./combinationTypes.js";
import { en1990Templates, type ImposedLoadCategory, type SnowSite } from "./en1990Presets.js";
import { expandTemplates } from "./expandTemplates.js";

export type CombinationPresetId = "asce7-22-strength" | "asce7-22-allowable" | "en1990-6.10";

export const COMBINATION_PRESETS: readonly { id: CombinationPresetId; name: string; source: string }[] = [
  { id: "asce7-22-strength", name: "ASCE 7-22 strength (LRFD)", source: "ASCE/SEI 7-22 §2.3.1" },
  { id: "asce7-22-allowable", name: "ASCE 7-22 allowable stress (ASD)", source: "ASCE/SEI 7-22 §2.4.1" },
  { id: "en1990-6.10", name: "EN 1990 eq. 6.10 (STR/GEO, set B)", source: "EN 1990:2002+A1 eq. 6.10, Tables A1.1 and A1.2(B)" },
];

export interface GenerateOptions {
  /** ASCE/SEI 7-22 §2.3.1 Exception 1: companion L at 0.5 in combinations 3, 4 and 6. Default "full". */
  readonly companionLive?: "full" | "half-per-exception-1";
  /** EN 1990 Table A1.1 imposed-load category for ψ0. Default "A-D" (ψ0 = 0.7). */
  readonly imposed?: ImposedLoadCategory;
  /** EN 1990 Table A1.1 snow ψ0 by site. Default "altitude-up-to-1000m" (ψ0 = 0.5). */
  readonly snowSite?: SnowSite;
  /** Prefix of generated ids; defaults "LRFD", "ASD", "EC". */
  readonly idPrefix?: string;
  /** Ids already used (load cases are always avoided). */
  readonly takenIds?: readonly string[];
}

function presetTemplates(presetId: CombinationPresetId, options: GenerateOptions): { templates: readonly CombinationTemplate[]; prefix: string; notes: string[] } {
  switch (presetId) {
    case "asce7-22-strength":
      return {
        templates: ASCE7_22_STRENGTH,
        prefix: "LRFD",
        notes: [
          ASCE7_LIVE_EXCEPTION_NOTE,
          "In ASCE/SEI 7-22 snow is a strength-level load: 1.0 where it leads; the companion factors 0.3 and 0.15 (with E) are from memory, verify.",
          "Wind and earthquake cases act as modelled: model each direction as its own case; each yields its own combination.",
        ],
      };
    case "asce7-22-allowable":
      return {
        templates: ASCE7_22_ALLOWABLE,
        prefix: "ASD",
        notes: [
          "ASD factors 0.6W, 0.7E and 0.7S (strength-level snow in ASCE/SEI 7-22); verify against the standard.",
          "Wind and earthquake cases act as modelled: model each direction as its own case; each yields its own combination.",
        ],
      };
    case "en1990-6.10":
      return {
        templates: en1990Templates({ imposed: options.imposed ?? "A-D", snowSite: options.snowSite ?? "altitude-up-to-1000m" }),
        prefix: "EC",
        notes: [
          "γG = 1.35 unfavourable / 1.00 favourable applied to all permanent cases together (Table A1.2(B) Note 3); γQ = 1.5.",
          "Accompanying variable actions are taken as unfavourable; delete them where they relieve the effect.",
          "Roof live load is imposed category H (ψ0 = 0), so it never accompanies.",
          "Eq. 6.10a/6.10b are not generated; the national annex chooses between 6.10 and 6.10a/b.",
        ],
      };
    default:
      return exhaustive(presetId);
  }
}

function skipReason(category: LoadCategory, presetId: CombinationPresetId): string {
  if (category === "settlement")
    return "settlement is a self-straining action: add it to the combinations with the factor your code requires";
  if (category === "other") return "category 'other' has no factor in the preset: add it by editing";
  if (presetId === "en1990-6.10" && category === "earthquake") return "seismic combinations follow EN 1990 eq. 6.12, not 6.10";
  if (presetId === "en1990-6.10" && category === "rain") return "EN 1990 Table A1.1 gives no ψ0 for rain: add it by editing";
  return "no combination of this preset applies to the cases present";
}

/**
 * Generates the combinations of a preset for the load cases present, in the contract's
 * `combinations` shape plus a source label. Combinations whose principal variable action is absent
 * are omitted. Live-load reduction is not applied.
 */
export function generateCombinations(presetId: CombinationPresetId, cases: readonly LoadCaseRef[], options: GenerateOptions = {}): CombinationSet {
  const preset = presetTemplates(presetId, options);
  const source = COMBINATION_PRESETS.find((p) => p.id === presetId)?.source ?? presetId;
  const combinations: GeneratedCombination[] = expandTemplates(preset.templates, cases, {
    idPrefix: options.idPrefix ?? preset.prefix,
    clause: source.split(",")[0] ?? source,
    companionLiveFactor: options.companionLive === "half-per-exception-1" ? 0.5 : undefined,
    takenIds: new Set([...cases.map((c) => c.id), ...(options.takenIds ?? [])]),
  });
  const used = new Set(combinations.flatMap((c) => Object.keys(c.factors)));
  const skipped: SkippedCase[] = cases
    .filter((c) => !used.has(c.id))
    .map((c) => ({ caseId: c.id, category: c.category, reason: skipReason(c.category, presetId) }));
  return { presetId, source, combinations, skipped, notes: [...preset.notes, LIVE_LOAD_REDUCTION_NOTE] };
}
