import { describe, expect, it } from "vitest";
import { render, screen } from "@testing-library/react";
import { twoSpanDocument } from "../commands/testDocument";
import { EditorStore } from "../store/EditorStore";
import { EditorStoreContext } from "../store/useEditor";
import { Palette } from "./Palette";

function renderPalette(canEdit: boolean) {
  const store = new EditorStore(twoSpanDocument(), { canEdit });
  render(
    <EditorStoreContext.Provider value={store}>
      <Palette />
    </EditorStoreContext.Provider>,
  );
  return (name: string) => (screen.getByRole("button", { name }) as HTMLButtonElement).disabled;
}

describe("the palette", () => {
  it("disables every editing tool for a read-only role, keeping select, pan and the view", () => {
    const isDisabled = renderPalette(false);
    for (const name of ["Point load", "Line load", "Moment", "Split", "+ Span", "Pin", "Fixed", "Hinge"]) expect(isDisabled(name), name).toBe(true);
    for (const name of ["Select", "Pan", "Fit", "Zoom +", "Zoom −"]) expect(isDisabled(name), name).toBe(false);
  });

  it("enables the editing tools for a role that may edit", () => {
    const isDisabled = renderPalette(true);
    for (const name of ["Point load", "Split", "+ Span", "Pin"]) expect(isDisabled(name), name).toBe(false);
  });
});
