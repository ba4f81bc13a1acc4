import { describe, expect, it } from "vitest";
import type { BeamDesignSettings } from "@spanwright/contracts";
import { checksReportUrl, reportDefaults, reportQuery, SAVED_TYPED_SECTION } from "./checksReportQuery";

const P = "6a0f3c52-8d1e-4b7a-9c2f-1e5d7b3a9c40";
const B = "c4d2e8f1-7a3b-4c5d-9e6f-2a1b3c4d5e6f";
const S = "0b6c1e52-3f4a-4d8b-9a7c-5e2f1d3c4b5a";
/** Invented saved settings: a project section, ASD, braces every 3.048 m (10 ft), Cb = 1.0. */
const saved: BeamDesignSettings = {
  section: { source: "project", sectionId: S }, material: null, method: "ASD", lb: 3.048, cb: "unity",
  strengthIds: null, deflection: null, allowableBending: null, allowableShear: null,
};
const sections = [{ id: S }];

describe("the report link's query", () => {
  it("is empty for the saved choices, a typed Lb equal to the saved one included", () => {
    const defaults = reportDefaults(saved, sections);
    expect(defaults).toEqual({ section: S, method: "ASD", lb: 3.048, cb: "unity" });
    // 10 ft typed and converted: 10 · 0.3048 may land an ulp away from the saved 3.048 m
    expect(reportQuery({ section: S, method: "ASD", lb: 3.0480000000000005, cb: "unity" }, defaults)).toEqual({});
    expect(checksReportUrl(P, B, 3, {})).toBe(`/api/projects/${P}/beams/${B}/revisions/3/report.pdf`);
  });

  it("names each changed part by the API's query names (sectionId, method, lb in m, cb)", () => {
    const q = reportQuery({ section: "other", method: "LRFD", lb: 2, cb: "equation-f1-1" }, reportDefaults(saved, sections));
    expect(q).toEqual({ sectionId: "other", method: "LRFD", lb: 2, cb: "equation-f1-1" });
    expect(checksReportUrl(P, B, 3, q)).toBe(`/api/projects/${P}/beams/${B}/revisions/3/report.pdf?sectionId=other&method=LRFD&lb=2&cb=equation-f1-1`);
  });

  it("never names the saved typed section, and falls back to the report's defaults with nothing saved", () => {
    const typed: BeamDesignSettings = { ...saved, section: { source: "typed", name: "I-300", shape: { kind: "i-shape" } }, material: { name: "steel" } };
    expect(reportDefaults(typed, []).section).toBe(SAVED_TYPED_SECTION);
    expect(reportQuery({ section: SAVED_TYPED_SECTION, method: "ASD", lb: null, cb: "unity" }, reportDefaults(typed, []))).toEqual({});
    expect(reportDefaults(null, sections)).toEqual({ section: null, method: "LRFD", lb: null, cb: "equation-f1-1" });
    // a saved project section no longer in the project is no default: the link must name one
    expect(reportDefaults(saved, []).section).toBeNull();
  });
});
