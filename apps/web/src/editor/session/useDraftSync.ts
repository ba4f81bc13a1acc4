import { useEffect, useRef } from "react";
import type { BeamDocument } from "../model/BeamDocument";
import { toExchange } from "../model/exchange";
import { clearDraft, writeDraft } from "../persistence/draftStorage";

const DELAY_MS = 400; // after the last edit; drags write once they pause

/**
 * Keeps the local draft in step with the open document: written while dirty (shortly after the
 * last edit, and at once when the page is hidden or the editor closes), cleared when clean.
 */
export function useDraftSync(key: string, doc: BeamDocument, isDirty: boolean, baseVersion: number, enabled: boolean): void {
  const timer = useRef<ReturnType<typeof setTimeout> | null>(null);
  const latest = useRef({ key, doc, isDirty, baseVersion, enabled });
  latest.current = { key, doc, isDirty, baseVersion, enabled };

  useEffect(() => {
    const flush = () => {
      const l = latest.current;
      if (timer.current) clearTimeout(timer.current);
      timer.current = null;
      if (l.enabled && l.isDirty) writeDraft(l.key, { baseVersion: l.baseVersion, savedAt: new Date().toISOString(), model: toExchange(l.doc) });
    };
    window.addEventListener("pagehide", flush);
    return () => {
      window.removeEventListener("pagehide", flush);
      if (timer.current) flush();
    };
  }, []);

  useEffect(() => {
    if (!enabled) return;
    if (timer.current) clearTimeout(timer.current);
    timer.current = null;
    if (!isDirty) {
      clearDraft(key);
      return;
    }
    timer.current = setTimeout(() => {
      timer.current = null;
      writeDraft(key, { baseVersion, savedAt: new Date().toISOString(), model: toExchange(doc) });
    }, DELAY_MS);
  }, [key, doc, isDirty, baseVersion, enabled]);
}
