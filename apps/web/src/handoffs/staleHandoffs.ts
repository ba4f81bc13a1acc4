import type { Handoff } from "@spanwright/contracts";

/**
 * The hand-offs whose recipients still hold outdated reactions: per beam, the newest stale one.
 * An older stale hand-off of a beam that was re-issued since is not stale any more (the API
 * compares each hand-off with the latest revision), so only current flags come back from it.
 */
export function outdatedHandoffs(handoffs: readonly Handoff[]): Handoff[] {
  const byBeam = new Map<string, Handoff>();
  for (const h of handoffs) {
    if (!h.stale) continue;
    const known = byBeam.get(h.beamId);
    if (known === undefined || h.issuedAt > known.issuedAt) byBeam.set(h.beamId, h);
  }
  return [...byBeam.values()];
}

/** Everyone who received a stale hand-off of the beam, once each, for the banner and the re-issue. */
export function outdatedRecipients(handoffs: readonly Handoff[], beamId: string): Handoff["recipients"] {
  const seen = new Set<string>();
  const out: Handoff["recipients"] = [];
  for (const h of handoffs) {
    if (!h.stale || h.beamId !== beamId) continue;
    for (const r of h.recipients) {
      if (seen.has(r.email)) continue;
      seen.add(r.email);
      out.push(r);
    }
  }
  return out;
}
