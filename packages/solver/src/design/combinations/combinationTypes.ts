/** Load categories of the exchange format (`loadCases[].category`). */
export const LOAD_CATEGORIES = ["dead", "live", "roof-live", "snow", "rain", "wind", "earthquake", "settlement", "other"] as const;
export type LoadCategory = (typeof LOAD_CATEGORIES)[number];

/** The part of a contract load case that combination generation needs. */
export interface LoadCaseRef {
  readonly id: string;
  readonly category: LoadCategory;
}

/** One load factor applied to every case of a category (or to one case, for directional categories). */
export interface Term {
  readonly category: LoadCategory;
  readonly factor: number;
  /** A companion live-load factor that ASCE/SEI 7-22 §2.3.1 Exception 1 allows to be 0.5. */
  readonly companionLive?: true;
}

/**
 * A place in a combination filled by one of several actions ("0.5(Lr or S or R)"). Each present
 * alternative yields its own combination. A required slot with no present alternative drops the
 * combination (its principal variable action is absent).
 */
export interface Slot {
  readonly alternatives: readonly Term[];
  readonly required: boolean;
}

export interface CombinationTemplate {
  /** Number as printed in the clause, e.g. "2" or "6a". */
  readonly number: string;
  /** The clause's expression, e.g. "1.2D + 1.6L + 0.5(Lr or S or R)". */
  readonly expression: string;
  readonly slots: readonly Slot[];
}

/** Matches the contract's `combinations[]` entries, plus where the factors come from. */
export interface GeneratedCombination {
  readonly id: string;
  readonly factors: Readonly<Record<string, number>>;
  /** Clause label, e.g. "ASCE/SEI 7-22 §2.3.1 combination 2". */
  readonly source: string;
  /** The clause's expression the factors came from. */
  readonly expression: string;
  /** The factors written out with case ids, e.g. "1.2 D + 1.6 L". */
  readonly label: string;
}

export interface SkippedCase {
  readonly caseId: string;
  readonly category: LoadCategory;
  readonly reason: string;
}

export interface CombinationSet {
  readonly presetId: string;
  readonly source: string;
  readonly combinations: readonly GeneratedCombination[];
  /** Cases no generated combination contains, with the reason; the user adds them by editing. */
  readonly skipped: readonly SkippedCase[];
  readonly notes: readonly string[];
}

/** Directional actions: each case is one alternative (e.g. wind from the left or from the right). */
export const DIRECTIONAL_CATEGORIES: ReadonlySet<LoadCategory> = new Set(["wind", "earthquake"]);

export const LIVE_LOAD_REDUCTION_NOTE =
  "Live-load reduction (e.g. ASCE/SEI 7-22 §4.7) is not applied: reduce the live-load case yourself where the code permits.";
