import { describe, expect, it } from "vitest";
import type { LoadCaseRef } from "./combinationTypes.js";
import { generateCombinations } from "./generateCombinations.js";

const D: LoadCaseRef = { id: "D", category: "dead" };
const L: LoadCaseRef = { id: "L", category: "live" };
const Lr: LoadCaseRef = { id: "Lr", category: "roof-live" };
const S: LoadCaseRef = { id: "S", category: "snow" };
const W1: LoadCaseRef = { id: "W1", category: "wind" };
const W2: LoadCaseRef = { id: "W2", category: "wind" };
const E: LoadCaseRef = { id: "E", category: "earthquake" };
const SET: LoadCaseRef = { id: "SET", category: "settlement" };

const factorsOf = (set: ReturnType<typeof generateCombinations>) => set.combinations.map((c) => c.factors);

describe("ASCE/SEI 7-22 §2.3.1 strength combinations", () => {
  it("with dead and live only: 1.4D (comb. 1) and 1.2D + 1.6L (comb. 2), nothing else", () => {
    const set = generateCombinations("asce7-22-strength", [D, L]);
    expect(factorsOf(set)).toEqual([{ D: 1.4 }, { D: 1.2, L: 1.6 }]);
    expect(set.combinations.map((c) => c.source)).toEqual(["ASCE/SEI 7-22 §2.3.1 combination 1", "ASCE/SEI 7-22 §2.3.1 combination 2"]);
    expect(set.combinations.map((c) => c.id)).toEqual(["LRFD1", "LRFD2"]);
  });

  it("with D, L, Lr and W: combinations 1–5 with the clause's factors, W at 1.0 and 0.5", () => {
    const set = generateCombinations("asce7-22-strength", [D, L, Lr, W1]);
    expect(factorsOf(set)).toEqual([
      { D: 1.4 },
      { D: 1.2, L: 1.6, Lr: 0.5 },
      { D: 1.2, Lr: 1.6, L: 1.0 },
      { D: 1.2, Lr: 1.6, W1: 0.5 },
      { D: 1.2, W1: 1.0, L: 1.0, Lr: 0.5 },
      { D: 0.9, W1: 1.0 },
    ]);
  });

  it("the 0.5L exception applies to the companion live load in 3, 4 and 6 only", () => {
    const set = generateCombinations("asce7-22-strength", [D, L, Lr, W1, E], { companionLive: "half-per-exception-1" });
    const byNumber = (n: string) => set.combinations.filter((c) => c.source.endsWith(` ${n}`)).map((c) => c.factors.L);
    expect(byNumber("2")).toEqual([1.6]);
    expect(byNumber("3")).toContain(0.5);
    expect(byNumber("4")).toEqual([0.5]);
    expect(byNumber("6")).toEqual([0.5]);
  });

  it("each wind direction case yields its own combination", () => {
    const set = generateCombinations("asce7-22-strength", [D, W1, W2]);
    expect(factorsOf(set)).toEqual([{ D: 1.4 }, { D: 1.2, W1: 1.0 }, { D: 1.2, W2: 1.0 }, { D: 0.9, W1: 1.0 }, { D: 0.9, W2: 1.0 }]);
    expect(set.combinations.map((c) => c.id)).toEqual(["LRFD1", "LRFD4.1", "LRFD4.2", "LRFD5.1", "LRFD5.2"]);
  });

  it("earthquake combinations 6 and 7: 1.2D + 1.0E + L + 0.15S and 0.9D + 1.0E (snow factor from memory)", () => {
    const set = generateCombinations("asce7-22-strength", [D, L, S, E]);
    expect(factorsOf(set)).toContainEqual({ D: 1.2, E: 1.0, L: 1.0, S: 0.15 });
    expect(factorsOf(set)).toContainEqual({ D: 0.9, E: 1.0 });
  });

  it("omits combinations whose variable actions are absent and reports settlement as not placed", () => {
    const set = generateCombinations("asce7-22-strength", [D, SET]);
    expect(factorsOf(set)).toEqual([{ D: 1.4 }]);
    expect(set.skipped).toEqual([expect.objectContaining({ caseId: "SET", category: "settlement" })]);
    expect(set.notes.join(" ")).toMatch(/live-load reduction .* not applied/i);
  });

  it("generated ids never clash with load-case ids", () => {
    const set = generateCombinations("asce7-22-strength", [{ id: "LRFD1", category: "dead" }]);
    expect(set.combinations[0]?.id).not.toBe("LRFD1");
  });
});

describe("ASCE/SEI 7-22 §2.4.1 allowable stress combinations", () => {
  it("D, L, Lr, W, E: W at 0.6 (×0.75 = 0.45 in 6a), E at 0.7 (×0.75 = 0.525 in 6b), 0.6D with W and E", () => {
    const set = generateCombinations("asce7-22-allowable", [D, L, Lr, W1, E]);
    expect(factorsOf(set)).toEqual([
      { D: 1 },
      { D: 1, L: 1 },
      { D: 1, Lr: 1 },
      { D: 1, L: 0.75, Lr: 0.75 },
      { D: 1, W1: 0.6 },
      { D: 1, E: 0.7 },
      { D: 1, W1: 0.45, L: 0.75, Lr: 0.75 },
      { D: 1, E: 0.525, L: 0.75 },
      { D: 0.6, W1: 0.6 },
      { D: 0.6, E: 0.7 },
    ]);
  });

  it("snow enters at 0.7 (strength-level snow in 7-22, from memory)", () => {
    expect(factorsOf(generateCombinations("asce7-22-allowable", [D, S]))).toContainEqual({ D: 1, S: 0.7 });
  });
});

describe("the recalled ASCE/SEI 7-22 snow factors hang together", () => {
  // 7-22 gives S at strength level. Its ASD combinations take 0.7S, so a service-level snow load is
  // about 0.7 of the strength-level one; the 7-16 companion factors on service-level snow, 0.5 with
  // dead + live and 0.2 with earthquake (ASCE/SEI 7-16 §2.3.1 and §2.3.6, from memory), times 0.7
  // should land near the recalled 7-22 factors 0.3 and 0.15. A check on the recollection, not a source.
  const factorOn = (preset: "asce7-22-strength" | "asce7-22-allowable", number: string, cases: LoadCaseRef[]) =>
    generateCombinations(preset, cases).combinations.find((c) => c.source.endsWith(` ${number}`))?.factors.S;

  it("ASD leads with 0.7S; LRFD companions 0.3S (≈ 0.5 × 0.7) and 0.15S with earthquake (≈ 0.2 × 0.7)", () => {
    const service = factorOn("asce7-22-allowable", "3", [D, S]);
    expect(service).toBe(0.7);
    expect(Math.abs(factorOn("asce7-22-strength", "2", [D, L, S])! - 0.5 * service!)).toBeLessThanOrEqual(0.05);
    expect(Math.abs(factorOn("asce7-22-strength", "6", [D, L, S, E])! - 0.2 * service!)).toBeLessThan(0.011);
    // ASD 4: 0.75 × 0.7S = 0.525S, the same conversion inside the 0.75 companion factor
    expect(factorOn("asce7-22-allowable", "4", [D, L, S])).toBeCloseTo(0.75 * service!, 12);
  });
});

describe("EN 1990:2002+A1 eq. 6.10 with Table A1.1 ψ0 and Table A1.2(B) γ", () => {
  it("live leading: 1.35G + 1.5Q; with snow and wind accompanying at 1.5ψ0 (0.5 and 0.6)", () => {
    const set = generateCombinations("en1990-6.10", [D, L, S, W1]);
    const fs = factorsOf(set);
    expect(fs[0]).toEqual({ D: 1.35 });
    expect(fs).toContainEqual({ D: 1.35, L: 1.5, S: 0.75, W1: 0.9 });
    expect(fs).toContainEqual({ D: 1.0, L: 1.5, S: 0.75, W1: 0.9 });
    expect(fs).toContainEqual({ D: 1.35, S: 1.5, L: 1.05, W1: 0.9 });
    expect(fs).toContainEqual({ D: 1.35, W1: 1.5, L: 1.05, S: 0.75 });
  });

  it("storage (category E, ψ0 = 1.0) and snow above 1000 m (ψ0 = 0.7) change the accompanying factors", () => {
    const set = generateCombinations("en1990-6.10", [D, L, S], { imposed: "E", snowSite: "above-1000m-or-nordic" });
    expect(factorsOf(set)).toContainEqual({ D: 1.35, L: 1.5, S: 1.05 });
    expect(factorsOf(set)).toContainEqual({ D: 1.35, S: 1.5, L: 1.5 });
  });

  it("roof live load (category H, ψ0 = 0) leads but never accompanies, nor joins snow (EN 1991-1-1 §3.3.2); earthquake is not placed", () => {
    const set = generateCombinations("en1990-6.10", [D, L, Lr, S, E]);
    expect(factorsOf(set)).toContainEqual({ D: 1.35, Lr: 1.5, L: 1.05 });
    expect(factorsOf(set)).toContainEqual({ D: 1.35, L: 1.5, S: 0.75 });
    expect(factorsOf(set).every((f) => !(f.Lr !== undefined && f.S !== undefined))).toBe(true);
    expect(set.skipped).toEqual([expect.objectContaining({ caseId: "E", reason: expect.stringContaining("6.12") })]);
  });
});
