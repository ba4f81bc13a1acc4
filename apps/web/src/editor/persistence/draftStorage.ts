import type { ExchangeModel } from "../model/exchange";

// Unsaved work survives a crash or reload: the open model is written to localStorage after each
// change and offered back on the next visit. Drafts remember the version they were edited from,
// so a draft made on an older revision is not silently applied on top of a newer one.

export interface Draft {
  readonly baseVersion: number;
  readonly savedAt: string;
  readonly model: ExchangeModel;
}

type KeyValueStore = Pick<Storage, "getItem" | "setItem" | "removeItem">;

export function draftKey(projectId: string, beamId: string): string {
  return `spanwright.editor.draft.${projectId}.${beamId}`;
}

function storage(): KeyValueStore | null {
  try {
    return typeof localStorage === "undefined" ? null : localStorage;
  } catch {
    return null; // storage disabled by the browser's privacy settings
  }
}

export function writeDraft(key: string, draft: Draft, store: KeyValueStore | null = storage()): void {
  try {
    store?.setItem(key, JSON.stringify(draft));
  } catch {
    // Quota exceeded: the draft is a convenience, the explicit save is the record.
  }
}

export function readDraft(key: string, store: KeyValueStore | null = storage()): Draft | null {
  const text = store?.getItem(key);
  if (!text) return null;
  try {
    const value = JSON.parse(text) as Partial<Draft>;
    if (typeof value.baseVersion !== "number" || typeof value.savedAt !== "string" || typeof value.model !== "object" || !value.model) return null;
    return value as Draft;
  } catch {
    return null;
  }
}

export function clearDraft(key: string, store: KeyValueStore | null = storage()): void {
  store?.removeItem(key);
}
