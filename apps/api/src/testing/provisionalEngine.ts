import type { Engine } from "../solve/engine.js";

/** Stand-in while the solver package has no entry point. */
export const provisionalEngine: Engine = {
  solve(model) {
    const m = model as { format?: unknown; nodes?: unknown[]; segments?: Array<{ I?: number }> };
    const fail = (code: string, message: string, where: string) =>
      Object.assign(new Error(message), { name: "SolverError", code, where });
    if (m?.format !== "spanwright.beam/1") throw fail("invalid-model", "format must be spanwright.beam/1", "format");
    const bad = (m.segments ?? []).findIndex((s) => !(typeof s.I === "number" && s.I > 0));
    if (bad >= 0) throw fail("invalid-model", "I must be positive", `segments[${bad}].I`);
    if ((m.nodes ?? []).filter((n) => (n as { support?: unknown }).support).length < 2) {
      throw fail("mechanism", "too few supports", "nodes");
    }
    return { format: "spanwright.result/1", results: {}, envelopes: {} };
  },
};
