import { describe, expect, it, vi } from "vitest";
import { fireEvent, render, screen } from "@testing-library/react";
import { MATERIAL_PRESETS } from "@spanwright/solver/design";
import { SectionEditor, type SectionChange } from "./SectionEditor";

function cell(symbol: string): string {
  return document.querySelector(`[data-symbol="${symbol}"]`)?.textContent ?? "";
}

describe("SectionEditor", () => {
  it("shows I = b·h³/12 and A = b·h for a solid rectangle typed in mm", () => {
    render(<SectionEditor units="si" initialShape={{ kind: "rectangle", b: 0.2, h: 0.4 }} />);
    // Closed form for a rectangle: I = b·h³/12 = 200·400³/12 = 1.0667e9 mm⁴; S = b·h²/6 = 5.333e6 mm³.
    expect(cell("I")).toBe("1.067e+9 mm⁴");
    expect(cell("A")).toBe("80000 mm²");
    expect(cell("Stop")).toBe("5.333e+6 mm³");
  });

  it("recomputes when a dimension changes and emits SI properties and segment fields", () => {
    const onChange = vi.fn<(c: SectionChange) => void>();
    const steel = MATERIAL_PRESETS.find((m) => m.id === "steel-a992")!;
    render(<SectionEditor units="si" initialShape={{ kind: "rectangle", b: 0.2, h: 0.4 }} material={steel} theory="timoshenko" onChange={onChange} />);
    fireEvent.change(screen.getByLabelText("Depth h (mm)"), { target: { value: "300" } });
    // b·h³/12 = 0.2·0.3³/12 = 4.5e-4 m⁴.
    expect(cell("I")).toBe("4.5e+8 mm⁴");
    const last = onChange.mock.calls.at(-1)?.[0];
    expect(last?.properties.I).toBeCloseTo(4.5e-4, 12);
    expect(last?.segment).toEqual({ ok: true, value: { E: 200e9, I: last?.properties.I, A: 0.06, G: 77e9, shearFactor: 5 / 6 } });
  });

  it("shows the engine's validation message beside the field it names", () => {
    render(<SectionEditor units="us" initialShape={{ kind: "i-shape", d: 0.4, bf: 0.18, tf: 0.012, tw: 0.008 }} />);
    fireEvent.change(screen.getByLabelText("Flange thickness tf (in)"), { target: { value: "9" } });
    expect(screen.getByText(/Two flanges \(2·tf\) must be thinner than the depth d/)).toBeTruthy();
    expect(screen.getByText("Fix the highlighted field to see the properties.")).toBeTruthy();
  });
});

describe("SectionEditor unit switch", () => {
  it("keeps the section when the display units change", () => {
    const { rerender } = render(<SectionEditor units="si" initialShape={{ kind: "rectangle", b: 0.2032, h: 0.4064 }} />);
    rerender(<SectionEditor units="us" initialShape={{ kind: "rectangle", b: 0.2032, h: 0.4064 }} />);
    // 203.2 mm = 8 in and 406.4 mm = 16 in exactly; I = 8·16³/12 = 2730.67 in⁴.
    expect((screen.getByLabelText("Width b (in)") as HTMLInputElement).value).toBe("8");
    expect(cell("I")).toBe("2731 in⁴");
  });
});
