import { useEffect, useRef } from "react";
import type { BeamDocument } from "../model/BeamDocument";
import { toExchange } from "../model/exchange";
import { clearDraft, writeDraft } from "../persistence/draftStorage";

const DELAY_MS = 400; // after the last edit; drags write once they pause

/** Keeps the local draft in step with the open document: written while dirty, cleared when clean. */
export function useDraftSync(key: string, doc: BeamDocument, isDirty: boolean, baseVersion: number, enabled: boolean): void {
  const timer = useRef<ReturnType<typeof setTimeout> | null>(null);
  useEffect(() => {
    if (!enabled) return;
    if (timer.current) clearTimeout(timer.current);
    if (!isDirty) {
      clearDraft(key);
      return;
    }
    timer.current = setTimeout(() => writeDraft(key, { baseVersion, savedAt: new Date().toISOString(), model: toExchange(doc) }), DELAY_MS);
    return () => {
      if (timer.current) clearTimeout(timer.current);
    };
  }, [key, doc, isDirty, baseVersion, enabled]);
}
