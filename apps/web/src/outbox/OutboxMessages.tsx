import type { OutboxMessage } from "@spanwright/contracts";
import { formatDate } from "../formatDate";

function formatSize(bytes: number): string {
  return bytes < 1024 ? `${bytes} B` : `${(bytes / 1024).toFixed(1)} KiB`;
}

/** Messages the local mail catcher received, newest first. */
export function OutboxMessages({ messages }: { messages: readonly OutboxMessage[] }) {
  if (messages.length === 0) return <p className="py-4 text-sm text-paper-600">No messages yet. Issue a revision to see its e-mail here.</p>;
  return (
    <ul className="divide-y divide-paper-200">
      {messages.map((m) => (
        <li key={m.id} className="py-3 text-sm">
          <details>
            <summary className="cursor-pointer">
              <span className="font-medium text-ink-900">{m.subject ?? "(no subject)"}</span>
              <span className="ml-2 text-paper-600">{`to ${m.to.join(", ")} · ${formatDate(m.receivedAt, true)}`}</span>
            </summary>
            <div className="mt-2 space-y-2 pl-4">
              <p className="text-xs text-paper-600">{`From ${m.from ?? "—"} · Message id ${m.messageId ?? "—"}`}</p>
              {m.attachments.length > 0 && (
                <ul className="text-xs text-paper-700">
                  {m.attachments.map((a, i) => (
                    <li key={i}>{`${a.filename ?? "(unnamed)"} · ${a.contentType} · ${formatSize(a.size)}`}</li>
                  ))}
                </ul>
              )}
              <pre className="max-h-80 overflow-auto whitespace-pre-wrap rounded-md bg-paper-50 p-3 font-mono text-xs text-paper-800">{m.text ?? ""}</pre>
            </div>
          </details>
        </li>
      ))}
    </ul>
  );
}
