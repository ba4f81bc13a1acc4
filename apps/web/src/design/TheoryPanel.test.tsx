import { describe, expect, it } from "vitest";
import { render, screen } from "@testing-library/react";
import { TheoryPanel } from "./TheoryPanel";
import type { DesignModel } from "./designModel";

const pinned = { type: "pinned" };

describe("TheoryPanel", () => {
  it("shows the shear share of a short deep span and hints that shear deformation matters", () => {
    // Rectangle 0.2 × 0.6 m, E = 10 GPa, G = E/16 (timber, invented), span 3 m: L/d = 5.
    const A = 0.12;
    const I = (0.2 * 0.6 ** 3) / 12;
    const model: DesignModel = {
      theory: "timoshenko",
      nodes: [{ x: 0, support: pinned }, { x: 3, support: pinned }],
      segments: [{ E: 10e9, I, A, G: 10e9 / 16, shearFactor: 5 / 6 }],
      loadCases: [],
    };
    render(<TheoryPanel model={model} theory="timoshenko" depth={0.6} units="si" />);
    // Simple span, UDL: shear/bending = (48/5)·EI/(κGA·L²) (Timoshenko & Gere; Roark 8th ed. §8.10).
    const r = ((48 / 5) * 10e9 * I) / ((5 / 6) * (10e9 / 16) * A * 9);
    const cell = document.querySelector("[data-share]");
    expect(Number(cell?.getAttribute("data-share"))).toBeCloseTo(r / (1 + r), 10);
    expect(screen.getByText(/L\/d = 5.0 is below about 10/)).toBeTruthy();
    expect((screen.getByLabelText(/Timoshenko/) as HTMLInputElement).disabled).toBe(true);
  });
});
