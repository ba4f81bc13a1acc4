import type { Locator, Page } from "playwright-core";

/*
 * Reading and driving the beam editor by roles, labels and visible text only (no test ids), as a
 * user of a screen reader or keyboard would find its parts.
 */

export const beamPath = (projectId: string, beamId: string): string => `/projects/${projectId}/beams/${beamId}`;

/** The model canvas (role "application"); the beam line is 170 px from its top (sceneLayout.BEAM_Y). */
export const canvasOf = (page: Page): Locator => page.getByRole("application", { name: /Beam canvas/ });
export const beamLineY = 170;
/** fitCamera leaves 60 px on each side of the beam (camera.ts, `marginPx`). */
const fitMarginPx = 60;

/** The revision and saved state next to the beam's name, e.g. "r2 · saved". */
export const saveStateOf = (page: Page): Locator => page.getByText(/^r\d+ · (saved|unsaved changes)$/);

export const saveButtonOf = (page: Page): Locator => page.getByRole("button", { name: "Save revision" });

/** Waits until the editor shows the beam with live results. */
export async function waitForEditor(page: Page, beamName: string): Promise<void> {
  await page.getByRole("heading", { level: 1, name: beamName }).waitFor();
  await canvasOf(page).waitFor();
  await page.getByRole("region", { name: "Results" }).getByText("Up to date").waitFor();
}

/** The text after "M" in the "Extremes (exact)" list, e.g. "max 22.5 kN·m at 3 m; min 0 kN·m at 0 m". */
export function momentExtremesOf(page: Page): Locator {
  const extremes = page
    .getByRole("region", { name: "Results" })
    .locator("section", { has: page.getByRole("heading", { name: "Extremes (exact)" }) });
  return extremes.locator("dt", { hasText: /^M$/ }).locator("xpath=following-sibling::dd[1]");
}

/** Clicks the canvas on the beam line at a fraction (0..1) of the beam's drawn length. */
export async function clickOnBeam(page: Page, fraction: number): Promise<void> {
  const canvas = canvasOf(page);
  const box = await canvas.boundingBox();
  if (!box) throw new Error("the beam canvas is not visible");
  const x = fitMarginPx + fraction * (box.width - 2 * fitMarginPx);
  await canvas.click({ position: { x, y: beamLineY } });
}

export async function openTableTab(page: Page, name: "Nodes" | "Segments" | "Loads" | "Load cases" | "Combinations"): Promise<Locator> {
  // Scoped to the "Tables" region: the results panel has tabs of its own.
  const tables = page.getByRole("region", { name: "Tables" });
  await tables.getByRole("tab", { name, exact: true }).click();
  const panel = tables.getByRole("tabpanel", { name, exact: true });
  await panel.getByRole("table").or(panel.getByText("Add a load case")).first().waitFor();
  return panel;
}

/** Types an exact value, key by key, into a labelled quantity cell and commits it with Enter. */
export async function typeQuantity(scope: Locator, label: RegExp, text: string): Promise<void> {
  const cell = scope.getByLabel(label);
  await cell.focus();
  await cell.press("Control+A");
  await cell.pressSequentially(text);
  await cell.press("Enter");
}

/** Rows of the open table's body. */
export const bodyRowsOf = (panel: Locator): Locator => panel.locator("tbody tr");

/** A toolbar button of the editor's palette, by its visible label ("Split", "Point load", ...). */
export const paletteButton = (page: Page, name: string): Locator =>
  page.getByRole("toolbar", { name: "Beam tools" }).getByRole("button", { name, exact: true });
