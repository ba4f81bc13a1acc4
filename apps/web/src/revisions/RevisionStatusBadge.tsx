import type { RevisionStatus } from "@spanwright/contracts";

const statusClasses: Record<RevisionStatus, string> = {
  draft: "bg-paper-200 text-paper-700",
  checked: "bg-success-50 text-success-600",
  issued: "bg-ink-100 text-ink-800",
};

const statusLabels: Record<RevisionStatus, string> = {
  draft: "Draft",
  checked: "Checked",
  issued: "Issued",
};

export function RevisionStatusBadge({ status }: { status: RevisionStatus }) {
  return (
    <span className={`inline-flex items-center rounded-sm px-2 py-0.5 text-xs font-semibold ${statusClasses[status]}`}>
      {statusLabels[status]}
    </span>
  );
}
