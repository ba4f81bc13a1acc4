import { describe, expect, it } from "vitest";
import { render, screen } from "@testing-library/react";
import { propertiesOfValidShape, type SectionShape } from "@spanwright/solver/design";
import { SectionView } from "./SectionView";

function stress(testId: string): number {
  return Number(screen.getByTestId(testId).getAttribute("data-value"));
}

describe("SectionView", () => {
  it("shows extreme fibre stresses M·c/I for a rectangle (sagging: top in compression)", () => {
    render(<SectionView shape={{ kind: "rectangle", b: 0.2, h: 0.4 }} E={30e9} M={100e3} V={0} theory="euler-bernoulli" units="si" />);
    // Navier: σ = M·c/I = 100e3 · 0.2 / (0.2·0.4³/12) = 18.75 MPa (hand calculation).
    expect(stress("stress-top")).toBeCloseTo(-18.75e6, 0);
    expect(stress("stress-bottom")).toBeCloseTo(18.75e6, 0);
    expect(screen.getByTestId("stress-bottom").textContent).toBe("18.75 MPa");
  });

  it("uses the distance to each fibre for an unsymmetric tee under hogging moment", () => {
    const tee: SectionShape = { kind: "tee", d: 0.3, bf: 0.2, tf: 0.02, tw: 0.01, orientation: "flange-top" };
    const p = propertiesOfValidShape(tee);
    const M = -50e3;
    render(<SectionView shape={tee} E={200e9} M={M} V={0} theory="euler-bernoulli" units="si" />);
    // σ = M·c/I with c = ȳtop above and d − ȳtop below the neutral axis; hogging puts the top in tension.
    expect(stress("stress-top")).toBeCloseTo((-M * p.yTop) / p.I, 0);
    expect(stress("stress-bottom")).toBeCloseTo((M * (p.depth - p.yTop)) / p.I, 0);
    expect(stress("stress-top")).toBeGreaterThan(0);
  });

  it("shows the Timoshenko shear strain −V/(κ·G·A)", () => {
    render(<SectionView shape={{ kind: "rectangle", b: 0.1, h: 0.2 }} E={200e9} G={80e9} M={0} V={-40e3} rz={0.001} theory="timoshenko" units="si" />);
    // γ = −V/(κGA) = 40e3 / (5/6 · 80e9 · 0.02) = 30 µε (Cowper κ = 5/6 at ν = 0).
    expect(screen.getByTestId("shear-strain").textContent).toBe("30 µε");
    // τmax = 1.5·V/A for a rectangle (Jourawski): 1.5 · 40e3 / 0.02 = 3 MPa in magnitude.
    expect(screen.getByTestId("shear-na").textContent).toBe("-3 MPa");
  });
});
