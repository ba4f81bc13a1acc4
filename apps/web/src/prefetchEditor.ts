import { useEffect } from "react";

let started = false;

/**
 * Signed in, the beam editor is where the day is spent: once a signed-in page is on screen and the
 * browser is idle, the editor's chunk is loaded (cached by the browser, evaluated once), so opening
 * a beam, here or in a new tab, does not wait for its download.
 */
export function usePrefetchEditor(): void {
  useEffect(() => {
    if (started) return;
    started = true;
    const whenIdle = window.requestIdleCallback ?? ((run: () => void) => window.setTimeout(run, 1000));
    whenIdle(() => void import("./editor/BeamEditorPage").catch(() => {}));
  }, []);
}
