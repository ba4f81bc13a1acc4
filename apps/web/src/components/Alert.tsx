import type { ReactNode } from "react";

export type AlertTone = "error" | "success" | "caution";

const toneClasses: Record<AlertTone, string> = {
  error: "border-danger-600 bg-danger-50 text-danger-700",
  success: "border-success-600 bg-success-50 text-success-600",
  caution: "border-ochre-500 bg-caution-50 text-caution-700",
};

/** Errors are announced at once (role=alert); other tones politely. */
export function Alert({ tone, title, children }: { tone: AlertTone; title?: string; children?: ReactNode }) {
  return (
    <div
      role={tone === "error" ? "alert" : "status"}
      className={`rounded-md border-l-4 px-4 py-3 text-sm ${toneClasses[tone]}`}
    >
      {title !== undefined && <p className="font-semibold">{title}</p>}
      {children !== undefined && <div className={title !== undefined ? "mt-0.5" : ""}>{children}</div>}
    </div>
  );
}
