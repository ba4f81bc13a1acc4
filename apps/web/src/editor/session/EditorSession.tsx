import { useEffect, useMemo, useState, useSyncExternalStore } from "react";
import { useNavigate } from "react-router";
import type { BeamResponse, Revision } from "@spanwright/contracts";
import { useCreateBeam } from "../../api/beams";
import { useSaveRevision, versionConflictOf } from "../../api/revisions";
import { describeError } from "../../api/client";
import { isDirty as historyIsDirty } from "../commands/history";
import { replaceDocument } from "../commands/documentCommands";
import { toExchange } from "../model/exchange";
import { deepEqual } from "../model/patch";
import { createTemplate } from "../model/templates";
import { clearDraft, draftKey, readDraft, type Draft } from "../persistence/draftStorage";
import { importModel } from "../persistence/importModel";
import { EditorStore } from "../store/EditorStore";
import { EditorStoreContext } from "../store/useEditor";
import type { UnitSystemId } from "../units/unitSystems";
import { EditorWorkspace } from "../EditorWorkspace";
import { EditorHeader } from "./EditorHeader";
import { LeaveDialog } from "./LeaveDialog";
import { SaveConflictDialog } from "./SaveConflictDialog";
import { DraftOffer } from "./DraftOffer";
import { useDraftSync } from "./useDraftSync";
import { useLeaveGuard } from "./useLeaveGuard";

export interface EditorSessionProps {
  readonly projectId: string;
  readonly initial: BeamResponse;
  readonly units: UnitSystemId;
  readonly canEdit: boolean;
}

/** One open beam: the editor store, saving with optimistic concurrency, drafts and leave guard. */
export function EditorSession({ projectId, initial, units, canEdit }: EditorSessionProps) {
  const beamId = initial.beam.id;
  const key = draftKey(projectId, beamId);
  const [{ store, loadProblem }] = useState(() => {
    const r = importModel(initial.revision.model, units);
    return r.ok
      ? { store: new EditorStore(r.doc, { canEdit }), loadProblem: null }
      : { store: new EditorStore(createTemplate("simple-span", units), { canEdit }), loadProblem: r.message };
  });
  const [baseVersion, setBaseVersion] = useState(initial.revision.version);
  const [draft, setDraft] = useState<Draft | null>(() => {
    const d = readDraft(key);
    return d && !deepEqual(d.model, toExchange(store.doc)) ? d : null;
  });
  const [conflict, setConflict] = useState<Revision | null>(null);
  const [saveError, setSaveError] = useState<string | null>(null);
  const [goTo, setGoTo] = useState<string | null>(null);
  const save = useSaveRevision(projectId, beamId);
  const createBeam = useCreateBeam(projectId);
  const navigate = useNavigate();
  const history = useSyncExternalStore(store.subscribe, () => store.getState().history);
  const dirty = useMemo(() => historyIsDirty(history), [history]);
  const blocker = useLeaveGuard(dirty && goTo === null);
  // Drafts wait until the user has answered the offer, so an old draft is not overwritten unseen.
  useDraftSync(key, history.doc, dirty, baseVersion, draft === null);

  // The role can change on a project refetch; the store's flag drives every editing action.
  useEffect(() => store.setUi({ canEdit }), [store, canEdit]);

  useEffect(() => {
    if (goTo && !dirty) navigate(goTo);
  }, [goTo, dirty, navigate]);

  const onSave = () => {
    if (!canEdit || save.isPending) return;
    const doc = store.doc;
    setSaveError(null);
    save.mutate(
      { baseVersion, model: toExchange(doc) as unknown as Record<string, unknown> },
      {
        onSuccess: (revision) => {
          setBaseVersion(revision.version);
          store.markSaved(doc);
          clearDraft(key);
        },
        onError: (error) => {
          const details = versionConflictOf(error);
          if (details) setConflict(details.current);
          else setSaveError(describeError(error));
        },
      },
    );
  };

  useEffect(() => {
    const onKey = (e: KeyboardEvent) => {
      if ((e.ctrlKey || e.metaKey) && e.key.toLowerCase() === "s") {
        e.preventDefault();
        onSave();
      }
    };
    window.addEventListener("keydown", onKey);
    return () => window.removeEventListener("keydown", onKey);
  });

  const reloadTheirs = (revision: Revision) => {
    const r = importModel(revision.model, store.doc.units);
    if (!r.ok) {
      setSaveError(r.message);
      return;
    }
    store.replace(r.doc);
    setBaseVersion(revision.version);
    clearDraft(key);
    setConflict(null);
  };

  const saveAsNew = () => {
    const model = toExchange(store.doc) as unknown as Record<string, unknown>;
    createBeam.mutate(
      { name: `${initial.beam.name} (my version)`, model, changeSummary: `Saved from a conflicting edit of ${initial.beam.name}` },
      {
        onSuccess: (created) => {
          clearDraft(key);
          store.markSaved();
          setConflict(null);
          setGoTo(`/projects/${projectId}/beams/${created.beam.id}`);
        },
        onError: (error) => setSaveError(describeError(error)),
      },
    );
  };

  return (
    <EditorStoreContext.Provider value={store}>
      <div className="space-y-3">
        <EditorHeader beamName={initial.beam.name} version={baseVersion} isDirty={dirty} canSave={canEdit} saving={save.isPending} onSave={onSave} />
        {loadProblem && <p role="alert" className="rounded-md bg-danger-50 px-3 py-2 text-sm text-danger-700">The saved model could not be opened ({loadProblem}); showing a simple span instead.</p>}
        {saveError && <p role="alert" className="rounded-md bg-danger-50 px-3 py-2 text-sm text-danger-700">Not saved: {saveError}</p>}
        {draft && (
          <DraftOffer
            draft={draft}
            currentVersion={baseVersion}
            onRestore={() => {
              const r = importModel(draft.model, store.doc.units);
              if (r.ok) store.run((d) => replaceDocument(d, { next: r.doc, label: "Restore unsaved changes" }));
              setDraft(null);
            }}
            onDiscard={() => {
              clearDraft(key);
              setDraft(null);
            }}
          />
        )}
        <EditorWorkspace />
      </div>
      {conflict && (
        <SaveConflictDialog current={conflict} mine={toExchange(store.doc)} units={store.doc.units} busy={createBeam.isPending} onReload={() => reloadTheirs(conflict)} onSaveAsNew={saveAsNew} onClose={() => setConflict(null)} />
      )}
      <LeaveDialog blocker={blocker} />
    </EditorStoreContext.Provider>
  );
}
