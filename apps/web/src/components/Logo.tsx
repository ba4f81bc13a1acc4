/** The mark: a continuous beam over three supports, ink on an ochre tile (reads on paper and on ink). */
export function LogoMark({ className }: { className?: string }) {
  return (
    <svg viewBox="0 0 32 32" aria-hidden="true" className={className}>
      <rect width="32" height="32" rx="7" className="fill-ochre-400" />
      <path d="M5 14h22" strokeWidth="2.6" strokeLinecap="round" className="stroke-ink-900" />
      <path d="M5 15.5l-3 5.5h6zM16 15.5l-3 5.5h6zM27 15.5l-3 5.5h6z" className="fill-ink-900" />
    </svg>
  );
}

export function Wordmark({ tone = "dark" }: { tone?: "dark" | "light" }) {
  return (
    <span className="inline-flex items-center gap-2">
      <LogoMark className="size-7 shrink-0" />
      <span
        className={`text-lg font-semibold tracking-tight ${tone === "light" ? "text-paper-50" : "text-ink-900"}`}
      >
        Spanwright
      </span>
    </span>
  );
}
