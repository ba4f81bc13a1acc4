/*
 * Run by boot.ts, the first module the entry evaluates (before React): startEarly() starts, at once, what the
 * first screen will wait for, so none of it queues behind the evaluation of the rest of the entry
 * chunk (React, the router, the query client) and then behind each other. On the beam editor's URL
 * that is the user, beam and project requests, the editor's chunk and the engine worker, which
 * solves the saved model as soon as it comes. It imports nothing heavy: only the request helper,
 * the route table and the worker's starter.
 */
import { routePath } from "@spanwright/contracts/routes";
import { requestEarly } from "./api/client";
import { loadSchemas } from "./api/schemas";
import { getSolverWorker, presolveSaved } from "./editor/results/solverWorker";

/** The params of the editor's URL (router.tsx: "projects/:projectId/beams/:beamId"), or null. */
export function editorRouteParams(pathname: string): { projectId: string; beamId: string } | null {
  const match = /^\/projects\/([^/]+)\/beams\/([^/]+)\/?$/.exec(pathname);
  if (!match) return null;
  try {
    return { projectId: decodeURIComponent(match[1]!), beamId: decodeURIComponent(match[2]!) };
  } catch {
    return null;
  }
}

export interface EarlyStarts {
  /** Starts the editor chunk's download (the route's lazy() then gets this one). */
  readonly loadEditor: () => void;
  readonly startWorker: () => void;
  /** Has the worker solve the saved model, so the editor's first render can show the results. */
  readonly presolve: (savedModel: unknown) => void;
}

const starts: EarlyStarts = {
  loadEditor: () => void import("./editor/BeamEditorPage"),
  startWorker: () => void getSolverWorker(),
  presolve: presolveSaved,
};

export function startEarly(pathname: string, { loadEditor, startWorker, presolve }: EarlyStarts = starts): void {
  requestEarly(routePath("me"));
  // a signed-in page parses the user's answer with the contracts' schemas; sign-in needs them only on submit
  if (!/^\/sign-(in|up)\/?$/.test(pathname)) void loadSchemas();
  const editor = editorRouteParams(pathname);
  if (!editor) return;
  const beam = requestEarly(routePath("getBeam", editor));
  requestEarly(routePath("getProject", { projectId: editor.projectId }));
  startWorker();
  loadEditor();
  beam.then(
    (body) => {
      const model = (body as { revision?: { model?: unknown } } | null)?.revision?.model;
      if (typeof model === "object" && model !== null) presolve(model);
    },
    () => {}, // the editor reports it when it asks
  );
}
