import type { Handoff, HandoffRecipient } from "@spanwright/contracts";

/**
 * Who still holds outdated reactions. A hand-off is `stale` when the beam's latest revision
 * changes an issued value beyond the project threshold; that stays true after a re-issue, so the
 * API also marks each recipient `outdated` unless a newer hand-off of the beam reached them.
 * An API without the per-recipient flag falls back to the hand-off's own `stale`.
 */
export function isRecipientOutdated(handoff: Handoff, recipient: HandoffRecipient): boolean {
  return recipient.outdated ?? handoff.stale;
}

export function hasOutdatedRecipients(handoff: Handoff): boolean {
  return handoff.recipients.some((r) => isRecipientOutdated(handoff, r));
}

/** Per beam, the newest hand-off whose recipients (some of them) hold outdated numbers. */
export function outdatedHandoffs(handoffs: readonly Handoff[]): Handoff[] {
  const byBeam = new Map<string, Handoff>();
  for (const h of handoffs) {
    if (!hasOutdatedRecipients(h)) continue;
    const known = byBeam.get(h.beamId);
    if (known === undefined || h.issuedAt > known.issuedAt) byBeam.set(h.beamId, h);
  }
  return [...byBeam.values()];
}

/** Everyone holding outdated reactions of the beam, once each: the banner's list and the re-issue's recipients. */
export function outdatedRecipients(handoffs: readonly Handoff[], beamId: string): HandoffRecipient[] {
  const seen = new Set<string>();
  const out: HandoffRecipient[] = [];
  for (const h of handoffs) {
    if (h.beamId !== beamId) continue;
    for (const r of h.recipients) {
      if (!isRecipientOutdated(h, r) || seen.has(r.email)) continue;
      seen.add(r.email);
      out.push(r);
    }
  }
  return out;
}

/** The oldest revision an outdated recipient holds, for the compare link: what they have vs the latest. */
export function oldestOutdatedVersion(handoffs: readonly Handoff[], beamId: string): number | null {
  let oldest: number | null = null;
  for (const h of handoffs) {
    if (h.beamId === beamId && hasOutdatedRecipients(h)) oldest = oldest === null ? h.version : Math.min(oldest, h.version);
  }
  return oldest;
}
