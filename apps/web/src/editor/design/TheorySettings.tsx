import { Suspense, useState } from "react";
import { TheoryDetails } from "./lazyDesign";

/** Beam settings: Euler-Bernoulli or Timoshenko (undoable), with the shear share per span. Closed
 * at first; its inside (and the design chunk) loads when it is opened. */
export function TheorySettings() {
  const [opened, setOpened] = useState(false);
  return (
    <details className="rounded-md border border-paper-300 bg-white px-3 py-2" onToggle={(e) => e.currentTarget.open && setOpened(true)}>
      <summary className="cursor-pointer text-sm font-semibold text-ink-900">Beam theory and shear deformation</summary>
      <div className="mt-2">
        {opened && (
          <Suspense fallback={<p className="text-sm text-paper-600">Loading…</p>}>
            <TheoryDetails />
          </Suspense>
        )}
      </div>
    </details>
  );
}
