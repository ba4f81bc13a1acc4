import { describe, expect, it } from "vitest";
import type { BeamDesignSettings } from "@spanwright/contracts";
import { findMaterialPreset } from "@spanwright/solver/design";
import { carryChoices, choicesFromSettings, defaultChoices, sameSettings, sameValue, settingsOf } from "./checkChoices";
import type { DesignModel } from "./designModel";

/** Invented demo beam: one simple span with dead and live cases and one combination. */
const model: DesignModel = {
  nodes: [{ x: 0, support: { type: "pinned" } }, { x: 6, support: { type: "pinned" } }],
  segments: [{ E: 200e9, I: 1e-4 }],
  loadCases: [{ id: "D", category: "dead" }, { id: "L", category: "live" }],
  combinations: [{ id: "C1", factors: { D: 1.2, L: 1.6 } }],
};
const steel = findMaterialPreset("steel-a992")!;
const typed = { source: "typed" as const, name: "I-300", shape: { kind: "i-shape", d: 0.3, bf: 0.15, tf: 0.01, tw: 0.006 } };

describe("check choices and saved design settings", () => {
  it("default to LRFD, braced at the supports, every combination and the IBC floor limits", () => {
    const c = defaultChoices(model);
    expect(c).toMatchObject({ method: "LRFD", lb: null, cb: "equation-f1-1", strengthIds: ["C1"], allowableBending: null });
    expect(c.rules.map((r) => [r.choice, r.ids])).toEqual([["floor-live", ["L"]], ["floor-total", []]]);
  });

  it("go to settings and back unchanged", () => {
    const saved: BeamDesignSettings = {
      section: typed, material: steel, method: "ASD", lb: 2.5, cb: "unity", strengthIds: ["C1"],
      deflection: [{ limit: { kind: "ratio", ratio: 300 }, ids: ["L"] }, { limit: { kind: "preset", presetId: "floor-total" }, ids: ["C1"] }],
      allowableBending: null, allowableShear: null,
    };
    const again = settingsOf(typed, steel, choicesFromSettings(saved, model), model);
    // the default strength list is saved as null, so a later combination joins the checks
    expect(again).toEqual({ ok: true, settings: { ...saved, strengthIds: null } });
  });

  it("refuse to save a typed deflection ratio that is not a number above zero", () => {
    const c = defaultChoices(model);
    const draft = settingsOf(typed, steel, { ...c, rules: [{ key: 1, choice: "typed", ratioText: "abc", ids: ["L"] }] }, model);
    expect(draft.ok).toBe(false);
  });

  it("compare numbers to 12 significant digits and ignore key order", () => {
    // 10 ft typed, read back in metres and shown in feet again: 3.048 / 0.3048 · 0.3048 may differ by an ulp
    expect(sameValue({ lb: 3.048, a: 1 }, { a: 1, lb: 3.0480000000000005 })).toBe(true);
    expect(sameValue({ lb: 3.048 }, { lb: 3.049 })).toBe(false);
    expect(sameSettings(null, undefined)).toBe(true);
  });
});

describe("carryChoices", () => {
  /** The demo beam before any combination: strength checks default to its load cases. */
  const bare: DesignModel = { ...model, combinations: [] };
  const generated: DesignModel = { ...model, combinations: [{ id: "LRFD1", factors: { D: 1.4 } }, { id: "LRFD2", factors: { D: 1.2, L: 1.6 } }] };

  it("moves default strength checks from the load cases to combinations generated afterwards, keeping the rest", () => {
    const before = { ...defaultChoices(bare), method: "ASD" as const, lb: 2 };
    expect(before.strengthIds).toEqual(["D", "L"]);
    const after = carryChoices(before, bare, generated);
    expect(after.strengthIds).toEqual(["LRFD1", "LRFD2"]);
    expect(after).toMatchObject({ method: "ASD", lb: 2, cb: "equation-f1-1" });
    // and saved as null ("every combination"), so the report follows the beam's combinations
    expect(settingsOf(typed, steel, after, generated)).toMatchObject({ ok: true, settings: { strengthIds: null } });
  });

  it("keeps a chosen list, dropping ids the model no longer has, here and in the deflection rules", () => {
    const before = { ...defaultChoices(model), strengthIds: ["C1", "D"], rules: [{ key: 1, choice: "floor-total", ratioText: "240", ids: ["C1", "L"] }] };
    const after = carryChoices(before, model, { ...model, combinations: [{ id: "C2", factors: { D: 1.4 } }] });
    expect(after.strengthIds).toEqual(["D"]);
    expect(after.rules.map((r) => r.ids)).toEqual([["L"]]);
  });

  it("leaves choices unchanged when the model did not change", () => {
    const c = defaultChoices(model);
    expect(carryChoices(c, model, model)).toEqual(c);
  });
});
