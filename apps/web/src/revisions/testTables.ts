import type { ReactionTableJson } from "@spanwright/contracts";

/**
 * Invented reaction tables for tests (SI, contract signs: fy positive upward). Two spans, a fixed
 * left end and a pinned right end; S3 is pulled down under wind (uplift).
 */
export function sampleReactionTable(scale = 1): ReactionTableJson {
  const supports = [
    { node: 0, label: "S1", x: 0, support: "fixed" },
    { node: 1, label: "S2", x: 6, support: "pinned" },
    { node: 2, label: "S3", x: 12, support: "pinned" },
  ];
  const rows: ReactionTableJson["rows"] = [];
  const data: Array<[number, number, number, number, number]> = [
    // node, D fy, W fy, C1 fy, mz(D)
    [0, 20_000, 3_000, 28_000, -15_000],
    [1, 50_000, 1_000, 70_000, 0],
    [2, 10_000, -8_000, -1_000, 0],
  ];
  for (const [node, d, w, c1, mz] of data) {
    const s = supports[node]!;
    const base = { node, label: s.label, x: s.x, support: s.support };
    rows.push({ ...base, kind: "case", id: "D", category: "dead", fy: d * scale, mz: mz * scale, uplift: d < 0 });
    rows.push({ ...base, kind: "case", id: "W", category: "wind", fy: w * scale, mz: 0, uplift: w < 0 });
    rows.push({ ...base, kind: "combination", id: "C1", fy: c1 * scale, mz: mz * scale, uplift: c1 < 0 });
    rows.push({
      ...base,
      kind: "envelope",
      id: "*",
      fyMax: Math.max(c1, d) * scale,
      fyMin: Math.min(c1, d) * scale,
      mzMax: 0,
      mzMin: mz * scale,
      uplift: Math.min(c1, d) < 0,
    });
  }
  return { supports, rows };
}
