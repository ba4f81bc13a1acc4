import type { BeamDocument } from "../model/BeamDocument";
import type { CommandResult } from "../commands/DocChange";
import {
  applyChange,
  beginInteraction,
  cancelInteraction,
  commitInteraction,
  createHistory,
  markSaved,
  redo,
  undo,
  type EditorHistory,
} from "../commands/history";
import { defaultGridStep } from "../geometry/snapping";
import { createUiState, type UiState } from "./uiState";
import { pruneUi } from "./pruneUi";

export interface EditorState {
  readonly history: EditorHistory;
  readonly ui: UiState;
}

type Listener = () => void;

export interface EditorStoreOptions {
  /** false opens the beam read-only (viewer and checker roles); defaults to true. */
  readonly canEdit?: boolean;
}

/**
 * The open beam and the editor's UI state behind one subscribe/getState pair (for
 * useSyncExternalStore). Every document change goes through `run`, which applies a command's
 * patch or shows why it was refused; nothing else writes the document.
 */
export class EditorStore {
  private state: EditorState;
  private readonly listeners = new Set<Listener>();

  constructor(doc: BeamDocument, options: EditorStoreOptions = {}) {
    this.state = {
      history: createHistory(doc),
      ui: createUiState(doc.loadCases[0]?.id ?? null, defaultGridStep[doc.units], options.canEdit ?? true),
    };
  }

  getState = (): EditorState => this.state;

  subscribe = (listener: Listener): (() => void) => {
    this.listeners.add(listener);
    return () => this.listeners.delete(listener);
  };

  get doc(): BeamDocument {
    return this.state.history.doc;
  }

  private set(next: EditorState): void {
    if (next === this.state) return;
    this.state = { history: next.history, ui: pruneUi(next.ui, next.history.doc) };
    for (const l of this.listeners) l();
  }

  /** Runs a command against the current document; returns whether it applied. */
  run(command: (doc: BeamDocument) => CommandResult): boolean {
    const result = command(this.doc);
    if (!result.ok) {
      this.setUi({ notice: { tone: "error", text: result.error.message } });
      return false;
    }
    const history = applyChange(this.state.history, result.change);
    this.set({ history, ui: this.state.ui.notice ? { ...this.state.ui, notice: null } : this.state.ui });
    return true;
  }

  beginInteraction(label: string): void {
    this.set({ ...this.state, history: beginInteraction(this.state.history, label) });
  }

  commitInteraction(): void {
    this.set({ ...this.state, history: commitInteraction(this.state.history) });
  }

  cancelInteraction(): void {
    this.set({ ...this.state, history: cancelInteraction(this.state.history) });
  }

  undo(): void {
    this.set({ ...this.state, history: undo(this.state.history) });
  }

  redo(): void {
    this.set({ ...this.state, history: redo(this.state.history) });
  }

  setUi(patch: Partial<UiState>): void {
    this.set({ ...this.state, ui: { ...this.state.ui, ...patch } });
  }

  updateUi(update: (ui: UiState) => Partial<UiState>): void {
    this.setUi(update(this.state.ui));
  }

  /** Records that `saved` is on the server (clean state) without touching the open document. */
  markSaved(saved: BeamDocument = this.doc): void {
    this.set({ ...this.state, history: markSaved(this.state.history, saved) });
  }

  /** Opens another document (reload, conflict resolution), dropping undo history. */
  replace(doc: BeamDocument, saved: BeamDocument = doc): void {
    this.set({
      history: markSaved(createHistory(doc), saved),
      ui: { ...this.state.ui, selection: null, activeCaseId: doc.loadCases[0]?.id ?? null, visibleCases: null, resultTarget: null },
    });
  }
}
