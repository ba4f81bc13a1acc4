import { describe, expect, it } from "vitest";
import { createTemplate } from "../model/templates";
import { toExchange } from "../model/exchange";
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
