import { DIRECTIONAL_CATEGORIES, type CombinationTemplate, type GeneratedCombination, type LoadCaseRef, type LoadCategory, type Term } from "./combinationTypes.js";

export interface ExpandOptions {
  readonly idPrefix: string;
  /** Label of the clause, e.g. "ASCE/SEI 7-22 §2.3.1". */
  readonly clause: string;
  /** Factor replacing 1.0 on companion live load (ASCE/SEI 7-22 §2.3.1 Exception 1), else undefined. */
  readonly companionLiveFactor?: number;
  /** Ids already used by load cases or other combinations; generated ids avoid them. */
  readonly takenIds: ReadonlySet<string>;
}

type Choice = Term | null;

function cartesian<T>(lists: readonly (readonly T[])[]): T[][] {
  return lists.reduce<T[][]>((acc, list) => acc.flatMap((prefix) => list.map((item) => [...prefix, item])), [[]]);
}

function round(f: number): number {
  return Math.round(f * 1e9) / 1e9;
}

/** Every assignment of case ids to factors that the chosen terms produce. */
function factorMaps(terms: readonly Term[], byCategory: ReadonlyMap<LoadCategory, readonly string[]>, companionLive: number | undefined): Record<string, number>[] {
  const perTerm = terms.map((t) => {
    const factor = round(t.companionLive && companionLive !== undefined ? companionLive : t.factor);
    const ids = byCategory.get(t.category) ?? [];
    return DIRECTIONAL_CATEGORIES.has(t.category)
      ? ids.map((id) => [[id, factor]] as [string, number][])
      : [ids.map((id) => [id, factor] as [string, number])];
  });
  return cartesian(perTerm).map((parts) => Object.fromEntries(parts.flat()));
}

function labelOf(factors: Readonly<Record<string, number>>): string {
  return Object.entries(factors).map(([id, f]) => `${f} ${id}`).join(" + ");
}

function keyOf(factors: Readonly<Record<string, number>>): string {
  return JSON.stringify(Object.entries(factors).sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0)));
}

/**
 * Expands clause templates over the load cases present. Combinations whose required slot has no
 * present action are omitted; exact duplicates (same factors) keep only the first occurrence.
 */
export function expandTemplates(templates: readonly CombinationTemplate[], cases: readonly LoadCaseRef[], options: ExpandOptions): GeneratedCombination[] {
  const byCategory = new Map<LoadCategory, string[]>();
  for (const c of cases) byCategory.set(c.category, [...(byCategory.get(c.category) ?? []), c.id]);
  const present = (t: Term) => (byCategory.get(t.category)?.length ?? 0) > 0;
  const seen = new Set<string>();
  const taken = new Set(options.takenIds);
  const out: GeneratedCombination[] = [];
  for (const template of templates) {
    const slotChoices: Choice[][] = [];
    let omitted = false;
    for (const slot of template.slots) {
      const live = slot.alternatives.filter(present);
      if (live.length === 0 && slot.required) omitted = true;
      slotChoices.push(live.length > 0 ? live : [null]);
    }
    if (omitted) continue;
    const variants = cartesian(slotChoices).flatMap((choice) =>
      factorMaps(choice.filter((t): t is Term => t !== null), byCategory, options.companionLiveFactor),
    );
    const fresh = variants.filter((f) => Object.keys(f).length > 0 && !seen.has(keyOf(f)));
    fresh.forEach((factors, k) => {
      seen.add(keyOf(factors));
      let id = `${options.idPrefix}${template.number}${fresh.length > 1 ? `.${k + 1}` : ""}`;
      while (taken.has(id)) id = `${id}'`;
      taken.add(id);
      out.push({ id, factors, source: `${options.clause} combination ${template.number}`, expression: template.expression, label: labelOf(factors) });
    });
  }
  return out;
}
