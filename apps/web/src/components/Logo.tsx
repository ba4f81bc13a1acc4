/** The mark: a continuous beam over three supports, drawn in ochre on ink. */
export function LogoMark({ className }: { className?: string }) {
  return (
    <svg viewBox="0 0 32 32" aria-hidden="true" className={className}>
      <rect width="32" height="32" rx="6" className="fill-ink-900" />
      <path d="M4 14h24" strokeWidth="3" strokeLinecap="round" className="stroke-ochre-400" />
      <path d="M4 14 Q10 22 16 14 Q22 22 28 14" fill="none" strokeWidth="1.2" className="stroke-ochre-200" strokeDasharray="1.5 1.5" />
      <path d="M4 15l-2.5 5h5zM16 15l-2.5 5h5zM28 15l-2.5 5h5z" className="fill-paper-100" />
    </svg>
  );
}

export function Wordmark({ tone = "dark" }: { tone?: "dark" | "light" }) {
  return (
    <span className="inline-flex items-center gap-2">
      <LogoMark className="size-7" />
      <span
        className={`text-lg font-semibold tracking-tight ${tone === "light" ? "text-paper-50" : "text-ink-900"}`}
      >
        Spanwright
      </span>
    </span>
  );
}
