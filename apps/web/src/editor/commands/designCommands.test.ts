import { describe, expect, it } from "vitest";
import { findMaterialPreset, generateCombinations, type Material, type SectionShape } from "@spanwright/solver/design";
import type { BeamDocument } from "../model/BeamDocument";
import { toExchange } from "../model/exchange";
import type { CommandResult } from "./DocChange";
import { addCombinations, setSegmentSection } from "./designCommands";
import { setTheory } from "./documentCommands";
import { editSegment } from "./segmentCommands";
import { applyChange, createHistory, redo, undo, type EditorHistory } from "./history";
import { ids, twoSpanDocument } from "./testDocument";

function apply(h: EditorHistory, make: (d: BeamDocument) => CommandResult): EditorHistory {
  const result = make(h.doc);
  if (!result.ok) throw new Error(result.error.message);
  return applyChange(h, result.change);
}

const steel = findMaterialPreset("steel-a992")!;
// Solid rectangle 200 × 400 mm: A = b·h, I = b·h³/12 (closed forms, any mechanics text).
const rectangle: SectionShape = { kind: "rectangle", b: 0.2, h: 0.4 };
const bh3over12 = (0.2 * 0.4 ** 3) / 12;

describe("setSegmentSection", () => {
  it("sets E, I, A, G and κ of the selected segments from the shape and material, in one undo step", () => {
    const start = createHistory(twoSpanDocument());
    const h = apply(start, (d) => setSegmentSection(d, { segmentIds: [ids.s0, ids.s1], shape: rectangle, material: steel }));
    for (const s of h.doc.segments) {
      expect(s.E).toBe(steel.E);
      expect(s.I).toBeCloseTo(bh3over12, 15);
      expect(s.A).toBeCloseTo(0.08, 15);
      expect(s.G).toBe(steel.G);
      expect(s.shearFactor).toBeGreaterThan(0);
      expect(s.section).toEqual({ shape: rectangle, material: steel });
    }
    expect(h.undoStack).toHaveLength(1);
    expect(undo(h).doc).toEqual(start.doc);
    expect(redo(undo(h)).doc).toEqual(h.doc);
  });

  it("leaves the section out of the exchange model, which carries the stiffness only", () => {
    const h = apply(createHistory(twoSpanDocument()), (d) => setSegmentSection(d, { segmentIds: [ids.s0], shape: rectangle, material: steel }));
    const segment = toExchange(h.doc).segments[0]!;
    expect(Object.keys(segment).sort()).toEqual(["A", "E", "G", "I", "shearFactor"]);
  });

  it("refuses a Timoshenko section whose material has no G, and an invalid shape", () => {
    const { G: _G, ...noG } = steel satisfies Material;
    const timoshenko = { ...twoSpanDocument(), theory: "timoshenko" as const };
    expect(setSegmentSection(timoshenko, { segmentIds: [ids.s0], shape: rectangle, material: noG }).ok).toBe(false);
    expect(setSegmentSection(twoSpanDocument(), { segmentIds: [ids.s0], shape: rectangle, material: noG }).ok).toBe(true);
    expect(setSegmentSection(twoSpanDocument(), { segmentIds: [ids.s0], shape: { kind: "rectangle", b: -1, h: 0.4 }, material: steel }).ok).toBe(false);
  });

  it("typing a stiffness by hand drops the section it no longer matches", () => {
    let h = apply(createHistory(twoSpanDocument()), (d) => setSegmentSection(d, { segmentIds: [ids.s0], shape: rectangle, material: steel }));
    h = apply(h, (d) => editSegment(d, { segmentId: ids.s0, props: { I: 1e-4 } }));
    expect(h.doc.segments[0]!.section).toBeUndefined();
    expect(h.doc.segments[0]!.I).toBe(1e-4);
  });
});

describe("setTheory", () => {
  it("switches to Timoshenko and back with undo and redo", () => {
    const start = createHistory(twoSpanDocument());
    const h = apply(start, (d) => setTheory(d, { theory: "timoshenko" }));
    expect(h.doc.theory).toBe("timoshenko");
    expect(toExchange(h.doc).theory).toBe("timoshenko");
    expect(undo(h).doc.theory).toBe("euler-bernoulli");
    expect(redo(undo(h)).doc.theory).toBe("timoshenko");
  });
});

describe("addCombinations", () => {
  const generated = generateCombinations("asce7-22-strength", [
    { id: "D", category: "dead" },
    { id: "L", category: "live" },
  ]).combinations;

  it("adds ASCE 7-22 §2.3.1 1.2D + 1.6L to the document as one undo step", () => {
    const doc = { ...twoSpanDocument(), combinations: [] };
    const start = createHistory(doc);
    const h = apply(start, (d) => addCombinations(d, { combinations: generated }));
    expect(h.doc.combinations).toHaveLength(generated.length);
    // ASCE/SEI 7-22 §2.3.1 combination 2: 1.2D + 1.6L (+ 0.5 of Lr, S or R, absent here).
    const factorSets = h.doc.combinations.map((k) => Object.fromEntries(k.factors.map((f) => [f.caseId, f.factor])));
    expect(factorSets).toContainEqual({ [ids.dead]: 1.2, [ids.live]: 1.6 });
    // §2.3.1 combination 1: 1.4D.
    expect(factorSets).toContainEqual({ [ids.dead]: 1.4 });
    expect(h.undoStack).toHaveLength(1);
    expect(undo(h).doc.combinations).toEqual([]);
    expect(redo(undo(h)).doc.combinations).toEqual(h.doc.combinations);
  });

  it("refuses the whole set when a name is taken or a case is missing", () => {
    const doc = twoSpanDocument();
    const clash = [{ ...generated[0]!, id: "C1" }];
    expect(addCombinations(doc, { combinations: clash }).ok).toBe(false);
    const missing = [{ ...generated[0]!, factors: { W: 1 } }];
    expect(addCombinations(doc, { combinations: missing }).ok).toBe(false);
  });
});
