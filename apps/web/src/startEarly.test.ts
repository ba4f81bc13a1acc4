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
    const starts = { loadEditor: vi.fn(), startWorker: vi.fn() };
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
