import { useState } from "react";
import { Link } from "react-router";
import type { Handoff } from "@spanwright/contracts";
import { Button, buttonClasses } from "../components/Button";
import { HandoffDialog } from "./HandoffDialog";
import { oldestOutdatedVersion, outdatedHandoffs, outdatedRecipients } from "./staleHandoffs";

/**
 * The alert that the foundation designer holds outdated reactions: a newer revision changes an
 * issued value beyond the project's threshold. One line per beam, with compare and re-issue.
 */
export function StaleHandoffBanner({ handoffs, canIssue }: { handoffs: readonly Handoff[]; canIssue: boolean }) {
  const [reissuing, setReissuing] = useState<Handoff | null>(null);
  // Captured when the dialog opens, so the refetch after sending cannot change the pre-filled list.
  const [reissuingRecipients, setReissuingRecipients] = useState<Handoff["recipients"]>([]);
  const outdated = outdatedHandoffs(handoffs);

  // The dialog sits beside the banner, not inside it, so it outlives the banner: a successful
  // re-issue clears the alert while the dialog still shows its confirmation.
  return (
    <>
      {outdated.length > 0 && (
        <div role="status" className="space-y-2 rounded-md border-l-4 border-ochre-500 bg-caution-50 px-4 py-3 text-sm text-caution-700">
          <p className="font-semibold">The foundation designer holds outdated reactions</p>
          <ul className="space-y-2">
            {outdated.map((h) => {
              const to = outdatedRecipients(handoffs, h.beamId).map((r) => r.name ?? r.email).join(", ");
              const held = oldestOutdatedVersion(handoffs, h.beamId) ?? h.version;
              return (
                <li key={h.id} className="flex flex-wrap items-center gap-x-3 gap-y-1">
                  <span>
                    {`${h.beamName}: r${h.latestVersion} changes issued reactions of r${held} beyond the project threshold; held by ${to}.`}
                  </span>
                  <Link
                    to={`/projects/${h.projectId}/beams/${h.beamId}/compare?from=${held}&to=${h.latestVersion}`}
                    className={buttonClasses("secondary", "sm")}
                  >
                    {`Compare r${held} with r${h.latestVersion}`}
                  </Link>
                  {canIssue && (
                    <Button
                      size="sm"
                      variant="accent"
                      onClick={() => {
                        setReissuingRecipients(outdatedRecipients(handoffs, h.beamId));
                        setReissuing(h);
                      }}
                    >
                      {`Re-issue r${h.latestVersion}`}
                    </Button>
                  )}
                </li>
              );
            })}
          </ul>
        </div>
      )}
      {reissuing !== null && (
        <HandoffDialog
          projectId={reissuing.projectId}
          beamId={reissuing.beamId}
          beamName={reissuing.beamName}
          version={reissuing.latestVersion}
          initialRecipients={reissuingRecipients}
          onClose={() => setReissuing(null)}
        />
      )}
    </>
  );
}
