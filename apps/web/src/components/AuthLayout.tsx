import type { ReactNode } from "react";
import { Caution } from "./Caution";
import { Wordmark } from "./Logo";

/** Sign-in and sign-up: a quiet card on paper, with the product's promise beside it on wide screens. */
export function AuthLayout({ title, children, footer }: { title: string; children: ReactNode; footer: ReactNode }) {
  return (
    <div className="grid min-h-screen lg:grid-cols-[minmax(0,5fr)_minmax(0,4fr)]">
      <aside className="on-dark hidden flex-col justify-between bg-ink-900 p-12 text-paper-100 lg:flex">
        <Wordmark tone="light" />
        <div className="max-w-md">
          <p className="text-3xl font-semibold leading-tight text-paper-50">
            Continuous beams, solved exactly, with every revision kept.
          </p>
          <p className="mt-4 text-base text-paper-300">
            Draw the beam, read the diagrams and checks, and hand the support reactions to the foundation
            designer with a record of what was sent.
          </p>
          <svg viewBox="0 0 400 90" className="mt-10 w-full" aria-hidden="true">
            <path d="M10 40 H390" strokeWidth="4" className="stroke-ochre-400" />
            {/* Exaggerated deflected shape under gravity load: sagging spans, level over the interior supports. */}
            <path
              d="M10 40 C50 80 110 40 150 40 C185 40 175 62 210 62 C245 62 235 40 270 40 C300 40 350 80 390 40"
              fill="none"
              strokeWidth="1.5"
              strokeDasharray="4 4"
              className="stroke-ochre-200"
            />
            {[10, 150, 270, 390].map((x) => (
              <path key={x} d={`M${x} 42 l-9 16 h18 z`} className="fill-paper-200" />
            ))}
          </svg>
        </div>
        <Caution onDark />
      </aside>
      <main className="flex flex-col items-center justify-center px-6 py-12">
        <div className="w-full max-w-sm">
          <div className="mb-8 lg:hidden">
            <Wordmark />
          </div>
          <h1 className="text-2xl font-semibold tracking-tight text-ink-900">{title}</h1>
          <div className="mt-6">{children}</div>
          <div className="mt-6 text-sm text-paper-700">{footer}</div>
          <Caution className="mt-10 lg:hidden" />
        </div>
      </main>
    </div>
  );
}
