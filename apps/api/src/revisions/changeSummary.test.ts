import { describe, expect, it } from "vitest";
import type { BeamModel } from "@spanwright/handoff";
import { liveModel } from "../handoffs/teamFixture.js";
import { summariseRevisionChange } from "./changeSummary.js";

const before = liveModel() as unknown as BeamModel;
const heavier = liveModel(-10_000, -7_000) as unknown as BeamModel;

describe("summariseRevisionChange", () => {
  it.each([
    ["a first revision keeps the author's note", null, before, "First revision", "First revision"],
    ["a first revision with no note is empty", null, before, "", ""],
    ["an edit lists the model diff", before, heavier, "", "L: -5 kN/m -> -7 kN/m on spans 1-2 (x = 0..10 m)"],
    ["an edit with a note puts the note first", before, heavier, "new plant", "new plant: L: -5 kN/m -> -7 kN/m on spans 1-2 (x = 0..10 m)"],
    ["an unchanged model says so", before, before, "", "no model changes"],
  ] as const)("%s", (_title, a, b, note, expected) => {
    expect(summariseRevisionChange(a, b, "si", note)).toBe(expected);
  });

  it("writes US customary units for a US project", () => {
    expect(summariseRevisionChange(before, heavier, "us", "")).toMatch(/kip\/ft/);
  });

  it("stays within the column's 2000 characters", () => {
    expect(summariseRevisionChange(before, heavier, "si", "x".repeat(5000)).length).toBeLessThanOrEqual(2000);
  });
});
