import type { ExchangeModel } from "../model/exchange";
import { deepEqual } from "../model/patch";
import { formatQuantity } from "../units/formatQuantity";
import type { UnitSystemId } from "../units/unitSystems";

const supportText = (s: ExchangeModel["nodes"][number]["support"]) => s?.type ?? "no support";

/**
 * Plain sentences for how model `b` differs from model `a` (theirs vs. mine in a save
 * conflict), so the user can decide which to keep. Compares by position: nodes and segments by
 * index, cases and combinations by name. Key order is ignored (the server's JSON storage
 * reorders object keys).
 */
export function describeChanges(a: ExchangeModel, b: ExchangeModel, units: UnitSystemId): string[] {
  const out: string[] = [];
  const len = (x: number) => formatQuantity(x, units, "position", 6);
  if ((a.title ?? "") !== (b.title ?? "")) out.push(`Title “${a.title ?? ""}” → “${b.title ?? ""}”`);
  if ((a.theory ?? "euler-bernoulli") !== (b.theory ?? "euler-bernoulli")) out.push(`Beam theory ${a.theory} → ${b.theory}`);
  if (a.nodes.length !== b.nodes.length) out.push(`${a.nodes.length} nodes → ${b.nodes.length} nodes`);
  const common = Math.min(a.nodes.length, b.nodes.length);
  for (let i = 0; i < common; i++) {
    const na = a.nodes[i]!;
    const nb = b.nodes[i]!;
    if (na.x !== nb.x) out.push(`Node ${i + 1} moved ${len(na.x)} → ${len(nb.x)}`);
    if (!deepEqual(na.support ?? null, nb.support ?? null)) out.push(`Node ${i + 1} support ${supportText(na.support)} → ${supportText(nb.support)}`);
    if ((na.hinge ?? false) !== (nb.hinge ?? false)) out.push(`Node ${i + 1} hinge ${nb.hinge ? "added" : "removed"}`);
  }
  for (let i = 0; i < Math.min(a.segments.length, b.segments.length); i++) {
    if (!deepEqual(a.segments[i], b.segments[i])) out.push(`Segment ${i + 1} section or material changed`);
  }
  const casesA = new Map(a.loadCases.map((c) => [c.id, c]));
  const casesB = new Map(b.loadCases.map((c) => [c.id, c]));
  for (const [id, c] of casesA) {
    const other = casesB.get(id);
    if (!other) out.push(`Load case ${id} removed`);
    else {
      if (!deepEqual(c.loads, other.loads)) out.push(`Load case ${id}: loads changed (${c.loads.length} → ${other.loads.length})`);
      if (c.category !== other.category || (c.pattern ?? false) !== (other.pattern ?? false)) out.push(`Load case ${id}: category or pattern changed`);
    }
  }
  for (const id of casesB.keys()) if (!casesA.has(id)) out.push(`Load case ${id} added`);
  const combosA = new Map((a.combinations ?? []).map((k) => [k.id, k]));
  const combosB = new Map((b.combinations ?? []).map((k) => [k.id, k]));
  for (const [id, k] of combosA) {
    const other = combosB.get(id);
    if (!other) out.push(`Combination ${id} removed`);
    else if (!deepEqual(k.factors, other.factors)) out.push(`Combination ${id}: factors changed`);
  }
  for (const id of combosB.keys()) if (!combosA.has(id)) out.push(`Combination ${id} added`);
  return out;
}
