import type { EditorState, EditorStore } from "../store/EditorStore";

export interface Shortcut {
  /** KeyboardEvent.key, compared case-insensitively for letters. */
  readonly key: string;
  /** Ctrl on Windows/Linux, Cmd on macOS. */
  readonly mod?: boolean;
  readonly shift?: boolean;
}

/** One user action, defined once and used by the toolbar, the keyboard and the command palette. */
export interface EditorAction {
  readonly id: string;
  readonly label: string;
  readonly group: "edit" | "tool" | "beam" | "view";
  readonly shortcuts: readonly Shortcut[];
  isEnabled(state: EditorState): boolean;
  run(store: EditorStore): void;
}

export interface KeyInput {
  readonly key: string;
  readonly ctrlKey: boolean;
  readonly metaKey: boolean;
  readonly shiftKey: boolean;
  readonly altKey: boolean;
}

export function matchesShortcut(event: KeyInput, shortcut: Shortcut): boolean {
  if (event.altKey) return false;
  const mod = event.ctrlKey || event.metaKey;
  if (mod !== (shortcut.mod ?? false)) return false;
  // Shift changes some keys ("+" is Shift+= on many layouts), so only letters insist on it.
  const isLetter = /^[a-z]$/i.test(shortcut.key);
  if (isLetter && event.shiftKey !== (shortcut.shift ?? false)) return false;
  if (!isLetter && shortcut.shift !== undefined && event.shiftKey !== shortcut.shift) return false;
  return event.key.toLowerCase() === shortcut.key.toLowerCase();
}

export function formatShortcut(shortcut: Shortcut, isMac = false): string {
  const parts: string[] = [];
  if (shortcut.mod) parts.push(isMac ? "⌘" : "Ctrl");
  if (shortcut.shift) parts.push("Shift");
  parts.push(shortcut.key.length === 1 ? shortcut.key.toUpperCase() : shortcut.key);
  return parts.join("+");
}

export function findActionForKey(actions: readonly EditorAction[], event: KeyInput): EditorAction | undefined {
  return actions.find((a) => a.shortcuts.some((s) => matchesShortcut(event, s)));
}
