import type { BeamDocument, Combination, CombinationFactor, LoadCase, LoadCategory } from "../model/BeamDocument";
import { loadCategories } from "../model/BeamDocument";
import { createCaseId, createCombinationId, type CaseId, type CombinationId } from "../model/ids";
import { changed, isFiniteNumber, refused, type CommandResult } from "./DocChange";

/** Case and combination names share one namespace in the exchange format. */
function nameProblem(doc: BeamDocument, name: string, own?: CaseId | CombinationId): string | null {
  const trimmed = name.trim();
  if (trimmed === "") return "Give it a name.";
  if (trimmed === "*") return "“*” is reserved for the envelope over all combinations.";
  const taken = [...doc.loadCases, ...doc.combinations].some((r) => r.name === trimmed && r.id !== own);
  return taken ? `“${trimmed}” is already used by a load case or combination.` : null;
}

export function addLoadCase(
  doc: BeamDocument,
  args: { name: string; category: LoadCategory; pattern?: boolean; caseId?: CaseId },
): CommandResult {
  const problem = nameProblem(doc, args.name);
  if (problem) return refused("duplicate-name", problem);
  const loadCase: LoadCase = {
    id: args.caseId ?? createCaseId(),
    name: args.name.trim(),
    category: args.category,
    pattern: args.pattern ?? false,
    loads: [],
  };
  return changed(doc, "Add load case", { loadCases: [...doc.loadCases, loadCase] });
}

export function editLoadCase(
  doc: BeamDocument,
  args: { caseId: CaseId; name?: string; category?: LoadCategory; pattern?: boolean },
): CommandResult {
  const current = doc.loadCases.find((c) => c.id === args.caseId);
  if (!current) return refused("not-found", "That load case no longer exists.");
  if (args.name !== undefined) {
    const problem = nameProblem(doc, args.name, args.caseId);
    if (problem) return refused("duplicate-name", problem);
  }
  if (args.category !== undefined && !loadCategories.includes(args.category)) return refused("invalid-value", "Unknown category.");
  const next: LoadCase = {
    ...current,
    name: args.name?.trim() ?? current.name,
    category: args.category ?? current.category,
    pattern: args.pattern ?? current.pattern,
  };
  return changed(doc, "Edit load case", { loadCases: doc.loadCases.map((c) => (c.id === current.id ? next : c)) });
}

/** Deletes a case with its loads and removes its factor from every combination. */
export function deleteLoadCase(doc: BeamDocument, args: { caseId: CaseId }): CommandResult {
  if (!doc.loadCases.some((c) => c.id === args.caseId)) return refused("not-found", "That load case no longer exists.");
  return changed(doc, "Delete load case", {
    loadCases: doc.loadCases.filter((c) => c.id !== args.caseId),
    combinations: doc.combinations.map((k) =>
      k.factors.some((f) => f.caseId === args.caseId) ? { ...k, factors: k.factors.filter((f) => f.caseId !== args.caseId) } : k,
    ),
  });
}

function checkFactors(doc: BeamDocument, factors: readonly CombinationFactor[]): string | null {
  for (const f of factors) {
    if (!doc.loadCases.some((c) => c.id === f.caseId)) return "A factor refers to a deleted load case.";
    if (!isFiniteNumber(f.factor)) return "Factors must be numbers.";
  }
  return null;
}

export function addCombination(
  doc: BeamDocument,
  args: { name: string; factors: readonly CombinationFactor[]; combinationId?: CombinationId },
): CommandResult {
  const problem = nameProblem(doc, args.name) ?? checkFactors(doc, args.factors);
  if (problem) return refused("invalid-value", problem);
  const combination: Combination = { id: args.combinationId ?? createCombinationId(), name: args.name.trim(), factors: args.factors };
  return changed(doc, "Add combination", { combinations: [...doc.combinations, combination] });
}

export function editCombination(
  doc: BeamDocument,
  args: { combinationId: CombinationId; name?: string; factors?: readonly CombinationFactor[] },
): CommandResult {
  const current = doc.combinations.find((k) => k.id === args.combinationId);
  if (!current) return refused("not-found", "That combination no longer exists.");
  const problem =
    (args.name !== undefined ? nameProblem(doc, args.name, current.id) : null) ??
    (args.factors ? checkFactors(doc, args.factors) : null);
  if (problem) return refused("invalid-value", problem);
  const next: Combination = { ...current, name: args.name?.trim() ?? current.name, factors: args.factors ?? current.factors };
  return changed(doc, "Edit combination", { combinations: doc.combinations.map((k) => (k.id === current.id ? next : k)) });
}

/** Sets one factor; null removes the case from the combination. Order of factors is kept. */
export function setCombinationFactor(
  doc: BeamDocument,
  args: { combinationId: CombinationId; caseId: CaseId; factor: number | null },
): CommandResult {
  const current = doc.combinations.find((k) => k.id === args.combinationId);
  if (!current) return refused("not-found", "That combination no longer exists.");
  const exists = current.factors.some((f) => f.caseId === args.caseId);
  const factors =
    args.factor === null
      ? current.factors.filter((f) => f.caseId !== args.caseId)
      : exists
        ? current.factors.map((f) => (f.caseId === args.caseId ? { ...f, factor: args.factor! } : f))
        : [...current.factors, { caseId: args.caseId, factor: args.factor }];
  return editCombination(doc, { combinationId: current.id, factors });
}

export function deleteCombination(doc: BeamDocument, args: { combinationId: CombinationId }): CommandResult {
  if (!doc.combinations.some((k) => k.id === args.combinationId)) return refused("not-found", "That combination no longer exists.");
  return changed(doc, "Delete combination", { combinations: doc.combinations.filter((k) => k.id !== args.combinationId) });
}
