import { afterEach, describe, expect, it, vi } from "vitest";
import { editorRouteParams, startEarly } from "./startEarly";

afterEach(() => vi.unstubAllGlobals());

describe("editorRouteParams", () => {
  it("reads the project and beam of the editor's URL only", () => {
    expect(editorRouteParams("/projects/p1/beams/b%201")).toEqual({ projectId: "p1", beamId: "b 1" });
    expect(editorRouteParams("/projects/p1/beams/b1/")).toEqual({ projectId: "p1", beamId: "b1" });
    expect(editorRouteParams("/projects/p1/beams/b1/revisions")).toBeNull();
    expect(editorRouteParams("/projects/p1")).toBeNull();
    expect(editorRouteParams("/projects/p1/beams/%E0")).toBeNull();
  });
});

describe("startEarly", () => {
  it("asks for the user at once on any page; on the editor's URL also for the beam, project, editor chunk and worker", () => {
    const urls: string[] = [];
    vi.stubGlobal("fetch", (input: string) => {
      urls.push(input);
      return new Promise<Response>(() => {});
    });
    const starts = { loadEditor: vi.fn(), startWorker: vi.fn(), presolve: vi.fn() };
    startEarly("/sign-in", starts);
    expect(urls).toEqual(["/api/me"]);
    expect(starts.loadEditor).not.toHaveBeenCalled();
    urls.length = 0;
    startEarly("/projects/p1/beams/b1", starts);
    expect(urls.sort()).toEqual(["/api/me", "/api/projects/p1", "/api/projects/p1/beams/b1"]);
    expect(starts.loadEditor).toHaveBeenCalledOnce();
    expect(starts.startWorker).toHaveBeenCalledOnce();
  });
});

describe("startEarly on the editor's URL", () => {
  it("has the worker solve the saved model once the beam has come", async () => {
    const model = { format: "spanwright.beam/1", nodes: [], segments: [] };
    vi.stubGlobal("fetch", async (input: string) =>
      new Response(JSON.stringify(input.includes("/beams/") ? { beam: { id: "b1" }, revision: { version: 1, model } } : {}), { status: 200 }),
    );
    const starts = { loadEditor: vi.fn(), startWorker: vi.fn(), presolve: vi.fn() };
    startEarly("/projects/p1/beams/b1", starts);
    await vi.waitFor(() => expect(starts.presolve).toHaveBeenCalledWith(model));
  });
});
