import { describe, expect, it, vi } from "vitest";
import { fireEvent, render, screen } from "@testing-library/react";
import type { Material } from "@spanwright/solver/design";
import { MaterialPicker } from "./MaterialPicker";

describe("MaterialPicker", () => {
  it("marks presets as typical values and turns an edited preset into the user's own material", () => {
    const onChange = vi.fn<(m: Material) => void>();
    render(<MaterialPicker units="us" kinds={["steel"]} onChange={onChange} />);
    expect(screen.getByText("Typical values, confirm for your project.")).toBeTruthy();
    // The steel presets store E = 200 GPa (AISC 360-22 lists 29 000 ksi, the rounded US value).
    // 1 ksi = 6.894757293 MPa (NIST SP 811), so 200 GPa shows as 29 007.5 ksi.
    expect(Number((screen.getByLabelText("Modulus of elasticity E (ksi)") as HTMLInputElement).value)).toBeCloseTo(200e9 / 6894757.293168361, 4);

    fireEvent.change(screen.getByLabelText("Yield stress Fy (ksi)"), { target: { value: "65" } });
    expect(screen.queryByText("Typical values, confirm for your project.")).toBeNull();
    const edited = onChange.mock.calls.at(-1)?.[0];
    expect(edited?.typical).toBe(false);
    // 1 ksi = 6.894757 MPa (NIST SP 811): 65 ksi = 448.16 MPa.
    expect(edited?.Fy).toBeCloseTo(448.159e6, -3);
  });

  it("names the field of an invalid value", () => {
    render(<MaterialPicker units="si" />);
    fireEvent.change(screen.getByLabelText("Modulus of elasticity E (MPa)"), { target: { value: "-5" } });
    expect(screen.getByText("Modulus of elasticity E must be greater than zero")).toBeTruthy();
  });
});
