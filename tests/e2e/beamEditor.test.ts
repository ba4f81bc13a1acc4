import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { twoSpanModel } from "@spanwright/api/testing";
import {
  beamPath,
  bodyRowsOf,
  canvasOf,
  clickOnBeam,
  momentExtremesOf,
  openTableTab,
  paletteButton,
  saveButtonOf,
  saveStateOf,
  typeQuantity,
  waitForEditor,
} from "./editorPage";
import { expectStatus, flowTimeoutMs, setupTimeoutMs, signInThroughForm, uiTimeoutMs, startE2e, type E2eEnvironment, type SeededUser } from "./harness";

// Issues 4 and 7, real-browser suite: the viewer's read-only view, a save conflict from two tabs,
// and modelling a beam with mouse and keyboard, saved and found again after a reload.
let env: E2eEnvironment;
let lead: SeededUser;
let viewer: SeededUser;
let projectId: string;
const projectName = "Saltmarsh granary conversion";

async function createBeamThroughApi(name: string): Promise<string> {
  const res = expectStatus(
    await lead.client.post(`/api/projects/${projectId}/beams`, { name, model: twoSpanModel() }),
    201,
    "create beam",
  );
  return res.body.beam.id as string;
}

beforeAll(async () => {
  env = await startE2e("editor");
  lead = await env.signUp("Henrike Osei");
  viewer = await env.signUp("Pavel Nakamura");
  const project = expectStatus(await lead.client.post("/api/projects", { name: projectName, unitSystem: "si" }), 201, "create project");
  projectId = project.body.project.id as string;
  expectStatus(
    await lead.client.post(`/api/projects/${projectId}/members`, { email: viewer.email, role: "viewer" }),
    201,
    "invite viewer",
  );
}, setupTimeoutMs);
afterAll(async () => {
  await env?.close();
}, setupTimeoutMs);

describe("the beam editor in a real browser", () => {
  it(
    "shows a viewer the project, the revision and the beam without any way to add beams, issue or save revisions",
    async () => {
      const beamName = "Viewer beam B4";
      const beamId = await createBeamThroughApi(beamName);
      const context = await env.newContext();
      const page = await env.newPage(context, "viewer");
      await signInThroughForm(page, viewer);

      await page.getByRole("link", { name: new RegExp(projectName) }).click();
      await page.getByText("You: Viewer").waitFor();
      await page.getByText("Your role can open beams but not add or delete them.").waitFor();
      expect(await page.getByRole("form", { name: "New beam" }).count()).toBe(0);
      expect(await page.getByRole("button", { name: "Delete" }).count()).toBe(0);

      // The saved revision, read-only: reactions to read, nothing to issue or upload.
      await page.getByRole("link", { name: `Revisions of ${beamName}, latest r1` }).click();
      await page.getByRole("link", { name: "Open r1 read-only" }).click();
      await page.getByRole("heading", { name: `${beamName}, r1` }).waitFor();
      await page.getByRole("table", { name: "Support reactions of r1" }).waitFor();
      expect(await page.getByRole("button", { name: /^Issue/ }).count()).toBe(0);
      await env.screenshot(page, "viewer-revision");

      await page.getByRole("link", { name: "Open in editor" }).click();
      await waitForEditor(page, beamName);
      await page.getByText("Read only: your role cannot save revisions.").waitFor();
      expect(await saveButtonOf(page).isDisabled()).toBe(true);
      await env.screenshot(page, "viewer");

      // The cells are read-only, and Ctrl+S creates no revision either.
      const loads = await openTableTab(page, "Loads");
      expect(await loads.getByLabel(/^Load 1 intensity at x1 /).isEditable()).toBe(false);
      await page.keyboard.press("Control+s");
      await page.waitForLoadState("networkidle");
      const revisions = expectStatus(await lead.client.get(`/api/projects/${projectId}/beams/${beamId}/revisions`), 200, "revisions");
      expect(revisions.body.revisions).toHaveLength(1);
      await context.close();
    },
    flowTimeoutMs,
  );

  it(
    "answers a save from a stale second tab with the conflict dialog: reload theirs, or save mine as a new beam",
    async () => {
      const beamName = "Conflict beam C2";
      const beamId = await createBeamThroughApi(beamName);
      const context = await env.newContext();
      const first = await env.newPage(context, "conflict-first");
      await signInThroughForm(first, lead, beamPath(projectId, beamId));
      const second = await env.newPage(context, "conflict-second");
      await second.goto(beamPath(projectId, beamId));
      await waitForEditor(first, beamName);
      await waitForEditor(second, beamName);

      // First tab: a heavier line load, saved as r2.
      const firstLoads = await openTableTab(first, "Loads");
      await typeQuantity(firstLoads, /^Load 1 intensity at x1 /, "-12");
      await saveButtonOf(first).click();
      await saveStateOf(first).filter({ hasText: "r2 · saved" }).waitFor();

      // Second tab, still on r1: another change, saved -> 409 -> the conflict dialog.
      const secondLoads = await openTableTab(second, "Loads");
      await typeQuantity(secondLoads, /^Load 1 intensity at x2 /, "-8");
      await saveButtonOf(second).click();
      const dialog = second.getByRole("dialog", { name: "Someone saved this beam first" });
      await dialog.waitFor();
      await dialog.getByText("saved revision r2").waitFor();
      expect(await dialog.getByRole("button", { name: "Load r2 (discard mine)" }).isEnabled()).toBe(true);
      expect(await dialog.getByRole("button", { name: "Save mine as a new beam" }).isEnabled()).toBe(true);
      await env.screenshot(second, "conflict");

      // Reload: the second tab now shows r2 with the first tab's value, nothing unsaved.
      await dialog.getByRole("button", { name: "Load r2 (discard mine)" }).click();
      await dialog.waitFor({ state: "detached" });
      await saveStateOf(second).filter({ hasText: "r2 · saved" }).waitFor();
      expect(await secondLoads.getByLabel(/^Load 1 intensity at x1 /).inputValue()).toBe("-12");
      expect(await secondLoads.getByLabel(/^Load 1 intensity at x2 /).inputValue()).toBe("-10");

      // Again: the first tab saves r3, the second (on r2) conflicts and keeps its work as a new beam.
      await typeQuantity(firstLoads, /^Load 1 intensity at x2 /, "-15");
      await saveButtonOf(first).click();
      await saveStateOf(first).filter({ hasText: "r3 · saved" }).waitFor();
      await typeQuantity(secondLoads, /^Load 1 intensity at x2 /, "-9");
      await saveButtonOf(second).click();
      await dialog.getByText("saved revision r3").waitFor();
      await dialog.getByRole("button", { name: "Save mine as a new beam" }).click();
      await second.waitForURL((url) => url.pathname.startsWith(`/projects/${projectId}/beams/`) && !url.pathname.endsWith(beamId));
      await waitForEditor(second, `${beamName} (my version)`);
      await saveStateOf(second).filter({ hasText: "r1 · saved" }).waitFor();
      expect(await (await openTableTab(second, "Loads")).getByLabel(/^Load 1 intensity at x2 /).inputValue()).toBe("-9");

      // Nothing was lost on the server: r1..r3 of the original, and the copy.
      const revisions = expectStatus(await lead.client.get(`/api/projects/${projectId}/beams/${beamId}/revisions`), 200, "revisions");
      expect(revisions.body.revisions.map((r: { version: number }) => r.version)).toEqual([3, 2, 1]);
      const beams = expectStatus(await lead.client.get(`/api/projects/${projectId}/beams`), 200, "beams");
      expect(beams.body.beams.map((b: { name: string }) => b.name)).toContain(`${beamName} (my version)`);
      await context.close();
    },
    flowTimeoutMs,
  );

  it(
    "models a beam from a template with mouse and keyboard, solves it live, saves it and finds it again after a reload",
    async () => {
      const beamName = "Mezzanine beam M1";
      const context = await env.newContext();
      const page = await env.newPage(context, "modelling");
      await signInThroughForm(page, lead, `/projects/${projectId}`);

      // A new beam from a template, through the project page's form.
      const form = page.getByRole("form", { name: "New beam" });
      await form.getByLabel("Beam name").fill(beamName);
      await form.getByLabel("Start from").selectOption({ label: "Simple span, 6 m" });
      await env.screenshot(page, "project");
      await form.getByRole("button", { name: "Add beam" }).click();
      await page.waitForURL(new RegExp(`/projects/${projectId}/beams/[^/]+$`));
      const editorPath = new URL(page.url()).pathname;
      await waitForEditor(page, beamName);
      await saveStateOf(page).filter({ hasText: "r1 · saved" }).waitFor();
      // 5 kN/m over a 6 m simple span: wL²/8 = 22.5 kN·m at midspan (statics, common practice).
      const initial = (await momentExtremesOf(page).textContent()) ?? "";
      expect(initial).toContain("22.5 kN·m at 3 m");

      // Mouse: split the span with the palette's Split tool, then drop a point load on the beam.
      await paletteButton(page, "Split").click();
      await clickOnBeam(page, 0.3);
      expect(await bodyRowsOf(await openTableTab(page, "Nodes")).count()).toBe(3);
      await paletteButton(page, "Point load").click();
      await clickOnBeam(page, 0.7);
      await expect.poll(() => momentExtremesOf(page).textContent(), { timeout: uiTimeoutMs }).not.toBe(initial);
      expect(await bodyRowsOf(await openTableTab(page, "Loads")).count()).toBe(2);

      // Keyboard: another span by splitting segment 2, exact node positions, a second point load,
      // and exact values for the load placed with the mouse.
      const segments = await openTableTab(page, "Segments");
      await segments.getByRole("button", { name: "Split segment 2 at its middle" }).focus();
      await page.keyboard.press("Enter");
      const nodes = await openTableTab(page, "Nodes");
      await bodyRowsOf(nodes).nth(3).waitFor();
      await typeQuantity(nodes, /^Node 2 x /, "2");
      await typeQuantity(nodes, /^Node 3 x /, "4");
      const loads = await openTableTab(page, "Loads");
      await loads.getByRole("button", { name: "+ Point" }).focus();
      await page.keyboard.press("Enter");
      await bodyRowsOf(loads).nth(2).waitFor();
      await typeQuantity(loads, /^Load 2 x /, "3");
      await typeQuantity(loads, /^Load 2 force /, "-20");
      await typeQuantity(loads, /^Load 3 x /, "1.5");
      await typeQuantity(loads, /^Load 3 force /, "-10");

      // Statics of the 6 m simple span (common practice): R_A = 15 + 20·3/6 + 10·4.5/6 = 32.5 kN;
      // M(3 m) = 32.5·3 − 5·3²/2 − 10·1.5 = 60 kN·m, the maximum (shear changes sign at the 20 kN load).
      await expect.poll(() => momentExtremesOf(page).textContent(), { timeout: uiTimeoutMs }).toContain("60 kN·m at 3 m");
      await saveStateOf(page).filter({ hasText: "r1 · unsaved changes" }).waitFor();
      await env.screenshot(page, "editor");

      await saveButtonOf(page).click();
      await saveStateOf(page).filter({ hasText: "r2 · saved" }).waitFor();

      // After a reload: the same beam, version 2, four nodes, three loads and the same results.
      await page.reload();
      await waitForEditor(page, beamName);
      expect(new URL(page.url()).pathname).toBe(editorPath);
      await saveStateOf(page).filter({ hasText: "r2 · saved" }).waitFor();
      expect(await bodyRowsOf(await openTableTab(page, "Nodes")).count()).toBe(4);
      const reloadedLoads = await openTableTab(page, "Loads");
      expect(await bodyRowsOf(reloadedLoads).count()).toBe(3);
      expect(await reloadedLoads.getByLabel(/^Load 2 force /).inputValue()).toBe("-20");
      expect(await momentExtremesOf(page).textContent()).toContain("60 kN·m at 3 m");
      await context.close();
    },
    flowTimeoutMs,
  );

  it(
    "disables the palette's editing tools and the table cells for a viewer",
    async () => {
      const beamName = "Viewer beam B5";
      const beamId = await createBeamThroughApi(beamName);
      const context = await env.newContext();
      const page = await env.newPage(context, "viewer-disabled");
      await signInThroughForm(page, viewer, beamPath(projectId, beamId));
      await waitForEditor(page, beamName);
      const tools = page.getByRole("toolbar", { name: "Beam tools" });
      for (const name of ["Point load", "Line load", "Split", "+ Span", "Pin", "Hinge"]) {
        expect(await tools.getByRole("button", { name, exact: true }).isDisabled(), name).toBe(true);
      }
      const loads = await openTableTab(page, "Loads");
      expect(await loads.getByLabel(/^Load 1 intensity at x1 /).isEditable()).toBe(false);
      await context.close();
    },
    flowTimeoutMs,
  );
});
