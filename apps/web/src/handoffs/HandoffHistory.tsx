import { Link } from "react-router";
import type { Handoff } from "@spanwright/contracts";
import { formatDate } from "../formatDate";
import { hasOutdatedRecipients, isRecipientOutdated } from "./staleHandoffs";
import { TableHead } from "../components/TableHead";

/** Who issued which revision to whom, and when; newest first as the API sends it. */
export function HandoffHistory({ handoffs, showBeam = false }: { handoffs: readonly Handoff[]; showBeam?: boolean }) {
  if (handoffs.length === 0) return <p className="py-2 text-sm text-paper-600">Nothing has been issued yet.</p>;
  return (
    <div className="overflow-x-auto">
      <table className="w-full text-left text-sm">
        <TableHead columns={["When", showBeam && "Beam", "Revision", "Issued by", "To", "Message id"]} />
        <tbody>
          {handoffs.map((h) => (
            <tr key={h.id} className="border-b border-paper-100 align-top last:border-0">
              <td className="tabular whitespace-nowrap py-2 pr-3 text-paper-700">{formatDate(h.issuedAt, true)}</td>
              {showBeam && (
                <td className="py-2 pr-3">
                  <Link to={`/projects/${h.projectId}/beams/${h.beamId}/revisions`} className="font-medium text-ink-800 hover:underline">
                    {h.beamName}
                  </Link>
                </td>
              )}
              <td className="tabular whitespace-nowrap py-2 pr-3">
                r{h.version}
                {hasOutdatedRecipients(h) && (
                  <span className="ml-2 rounded-sm bg-ochre-100 px-1.5 py-0.5 text-xs font-semibold text-ochre-800" title={`r${h.latestVersion} changes ${h.staleValueCount} issued value(s) beyond the threshold`}>
                    outdated
                  </span>
                )}
              </td>
              <td className="py-2 pr-3 text-paper-800">{h.issuedBy.name}</td>
              <td className="py-2 pr-3 text-paper-800">
                <ul>
                  {h.recipients.map((r) => (
                    <li key={r.email}>
                      {r.name !== null ? `${r.name} <${r.email}>` : r.email}
                      {isRecipientOutdated(h, r) && <span className="ml-1 text-xs font-semibold text-ochre-800">(holds outdated reactions)</span>}
                    </li>
                  ))}
                </ul>
                {h.message !== null && <p className="mt-0.5 text-xs italic text-paper-600">{`“${h.message}”`}</p>}
              </td>
              <td className="max-w-[14rem] break-all py-2 pr-3 font-mono text-xs text-paper-600">{h.messageId}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
