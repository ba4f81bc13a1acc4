import type { ReactNode } from "react";

export function PageHeader({
  title,
  eyebrow,
  actions,
  children,
}: {
  title: string;
  eyebrow?: ReactNode;
  actions?: ReactNode;
  children?: ReactNode;
}) {
  return (
    <div className="mb-8 flex flex-wrap items-end justify-between gap-4 border-b border-paper-300 pb-5">
      <div className="min-w-0">
        {eyebrow !== undefined && <div className="mb-1 text-sm text-paper-600">{eyebrow}</div>}
        <h1 className="truncate text-2xl font-semibold tracking-tight text-ink-900">{title}</h1>
        {children}
      </div>
      {actions !== undefined && <div className="flex items-center gap-2">{actions}</div>}
    </div>
  );
}

export function Card({ title, children, actions }: { title?: string; children: ReactNode; actions?: ReactNode }) {
  return (
    <section className="rounded-lg border border-paper-300 bg-white shadow-card">
      {title !== undefined && (
        <header className="flex items-center justify-between gap-3 border-b border-paper-200 px-5 py-3">
          <h2 className="text-base font-semibold text-ink-900">{title}</h2>
          {actions}
        </header>
      )}
      <div className="px-5 py-4">{children}</div>
    </section>
  );
}
