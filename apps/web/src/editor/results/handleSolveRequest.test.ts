import { describe, expect, it } from "vitest";
import { createTemplate } from "../model/templates";
import { toExchange } from "../model/exchange";
import { importModel } from "../persistence/importModel";
import { handleSolveRequest } from "./handleSolveRequest";

describe("the solver worker's request handling", () => {
  it("answers with an analysis that survives structured clone", () => {
    const response = handleSolveRequest({ seq: 7, model: toExchange(createTemplate("two-equal-spans", "si")) });
    expect(response.seq).toBe(7);
    expect(response.ok).toBe(true);
    if (response.ok) expect(structuredClone(response.analysis).grid).toEqual(response.analysis.grid);
  });

  it("reports a mechanism as a value with where it is", () => {
    const model = toExchange(createTemplate("simple-span", "si"));
    model.nodes = model.nodes.map(({ x }) => ({ x })); // no supports at all
    const response = handleSolveRequest({ seq: 1, model });
    expect(response.ok).toBe(false);
    if (!response.ok) expect(response.error.code).toBe("mechanism");
  });

  it("reports an invalid model with its path", () => {
    const model = toExchange(createTemplate("simple-span", "si"));
    model.segments[0]!.I = -1;
    const response = handleSolveRequest({ seq: 1, model });
    expect(response.ok).toBe(false);
    if (!response.ok) {
      expect(response.error.code).toBe("invalid-model");
      expect(response.error.where).toContain("segments");
    }
  });
});

/** A saved revision as the API might hold it: a title, defaults written out, keys in another order. */
function savedModel(): Record<string, unknown> {
  const model = toExchange(createTemplate("two-equal-spans", "si")) as unknown as Record<string, unknown>;
  return {
    title: "Saved beam",
    ...model,
    nodes: (model.nodes as object[]).map((n) => ({ hinge: false, ...n })),
    loadCases: (model.loadCases as object[]).map((c) => ({ pattern: false, ...c })),
  };
}

describe("handleSolveRequest for a saved model", () => {
  it("solves the model the editor will ask about, and names it as the editor's useAnalysis does", () => {
    const saved = savedModel();
    const answer = handleSolveRequest({ seq: 7, model: saved, saved: true });
    expect(answer.seq).toBe(7);
    expect(answer.ok).toBe(true);
    // what EditorSession opens and useAnalysis sends for it
    const opened = importModel(saved, "si");
    if (!opened.ok) throw new Error(opened.message);
    const { nodes, segments, loadCases, combinations, theory, stations } = opened.doc;
    const editorModel = toExchange({ title: "", units: "si", nodes, segments, loadCases, combinations, theory, stations });
    expect(answer.model).toBe(JSON.stringify(editorModel));
    const direct = handleSolveRequest({ seq: 8, model: editorModel });
    expect(direct.ok && answer.ok && direct.analysis).toEqual(answer.ok && answer.analysis);
  });

  it("answers a failure, not a throw, for what is not a model", () => {
    expect(handleSolveRequest({ seq: 1, model: null, saved: true }).ok).toBe(false);
    expect(handleSolveRequest({ seq: 2, model: { format: "other" }, saved: true }).ok).toBe(false);
  });
});
