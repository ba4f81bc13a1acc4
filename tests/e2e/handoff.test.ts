import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { twoSpanModel } from "@spanwright/api/testing";
import { beamPath, openTableTab, saveButtonOf, saveStateOf, typeQuantity, waitForEditor } from "./editorPage";
import { expectStatus, flowTimeoutMs, setupTimeoutMs, signInThroughForm, startE2e, type E2eEnvironment, type SeededUser } from "./harness";

// Issue 5, real-browser flow: a changed load makes an issued reaction table outdated; the engineer
// compares, re-issues, and the e-mail (CSV and PDF attached) is in the local outbox.
let env: E2eEnvironment;
let lead: SeededUser;
let designer: SeededUser;
let projectId: string;
let beamId: string;
const projectName = "Wickham ropeworks annexe";
const beamName = "Gantry beam G3";

beforeAll(async () => {
  env = await startE2e("handoff");
  lead = await env.signUp("Marit Okonkwo");
  designer = await env.signUp("Ilse Baptiste");
  const project = expectStatus(await lead.client.post("/api/projects", { name: projectName, unitSystem: "si" }), 201, "create project");
  projectId = project.body.project.id as string;
  expectStatus(
    await lead.client.post(`/api/projects/${projectId}/members`, { email: designer.email, role: "viewer" }),
    201,
    "invite the foundation designer",
  );
  const beam = expectStatus(
    await lead.client.post(`/api/projects/${projectId}/beams`, { name: beamName, model: twoSpanModel() }),
    201,
    "create beam",
  );
  beamId = beam.body.beam.id as string;
  // r1 is already with the foundation designer when the flow starts.
  expectStatus(
    await lead.client.post(`/api/projects/${projectId}/beams/${beamId}/revisions/1/handoffs`, {
      recipients: [{ userId: designer.userId }],
    }),
    201,
    "issue r1",
  );
}, setupTimeoutMs);
afterAll(async () => {
  await env?.close();
}, setupTimeoutMs);

describe("the hand-off in a real browser", () => {
  it(
    "re-issues a changed load's reactions after comparing with the issued revision; the mail reaches the outbox and its link opens r2 for the designer",
    async () => {
      const context = await env.newContext();
      const page = await env.newPage(context, "reissue");
      await signInThroughForm(page, lead, beamPath(projectId, beamId));
      await waitForEditor(page, beamName);

      // The line load goes from 10 to 12 kN/m: every reaction grows by 20 %, beyond the 5 % default.
      const loads = await openTableTab(page, "Loads");
      await typeQuantity(loads, /^Load 1 intensity at x1 /, "-12");
      await typeQuantity(loads, /^Load 1 intensity at x2 /, "-12");
      await saveButtonOf(page).click();
      await saveStateOf(page).filter({ hasText: "r2 · saved" }).waitFor();

      // The beam's revisions page warns that the designer holds r1's outdated numbers.
      await page.getByRole("link", { name: `← ${projectName}` }).click();
      await page.getByRole("link", { name: `Revisions of ${beamName}, latest r2` }).click();
      const banner = page.getByRole("status").filter({ hasText: "The foundation designer holds outdated reactions" });
      await banner.waitFor();
      await banner.getByText(`held by ${designer.name}`).waitFor();
      await env.screenshot(page, "revisions-stale");

      // Compare r1 (issued) with r2: the reactions changed beyond the threshold.
      await banner.getByRole("link", { name: "Compare r1 with r2" }).click();
      await page.getByRole("heading", { name: `${beamName}: compare r1 with r2` }).waitFor();
      await page.getByRole("table", { name: "Reactions of r1 and r2 with the change" }).waitFor();
      await page.getByText(/changed by more than 5 % \(the project threshold\)/).waitFor();
      await env.screenshot(page, "compare");

      // Re-issue r2 to the same designer, from the banner.
      await page.goBack();
      await banner.getByRole("button", { name: "Re-issue r2" }).click();
      const dialog = page.getByRole("dialog", { name: `Issue ${beamName}, r2` });
      await dialog.waitFor();
      expect(await dialog.getByRole("checkbox", { name: new RegExp(designer.email.replace(/[.+]/g, "\\$&")) }).isChecked()).toBe(true);
      await dialog.getByRole("button", { name: "Send hand-off" }).click();
      // The confirmation stays while the banner goes (nothing is outdated any more), and the beam's
      // hand-off history lists r2 to the designer.
      await dialog.getByText(`Sent r2 to ${designer.name}.`).waitFor();
      await dialog.getByText(/Message id: <.+>/).waitFor();
      await banner.waitFor({ state: "detached" });
      await dialog.getByRole("button", { name: "Close" }).click();
      await dialog.waitFor({ state: "detached" });
      await page
        .getByRole("row")
        .filter({ hasText: designer.email })
        .filter({ has: page.getByRole("cell", { name: "r2", exact: true }) })
        .waitFor();

      // The outbox shows the e-mail to the designer, with the CSV and the PDF attached.
      await page.getByRole("link", { name: "Outbox", exact: true }).click();
      await page.getByRole("heading", { name: "Outbox" }).waitFor();
      const message = page.getByRole("listitem").filter({ hasText: `Support reactions: ${projectName}, ${beamName}, revision 2` });
      await message.waitFor();
      expect(await message.textContent()).toContain(`to ${designer.email}`);
      await message.getByText(`Support reactions: ${projectName}, ${beamName}, revision 2`).click();
      await message.getByText(/\.csv · text\/csv/).waitFor();
      await message.getByText(/\.pdf · application\/pdf/).waitFor();
      await env.screenshot(page, "outbox");
      const link = /Open the revision: (\S+)/.exec((await message.textContent()) ?? "")?.[1];
      expect(link).toBe(`${env.baseUrl}/projects/${projectId}/beams/${beamId}/revisions/2`);

      // The designer follows the mail's link, signs in, and reads r2 read-only.
      const designerContext = await env.newContext();
      const designerPage = await env.newPage(designerContext, "designer");
      await signInThroughForm(designerPage, designer, new URL(link!).pathname);
      await designerPage.getByRole("heading", { name: `${beamName}, r2` }).waitFor();
      await designerPage.getByRole("table", { name: "Support reactions of r2" }).waitFor();
      expect(await designerPage.getByRole("button", { name: /^Issue/ }).count()).toBe(0);
      await designerContext.close();

      const handoffs = expectStatus(await lead.client.get(`/api/projects/${projectId}/beams/${beamId}/handoffs`), 200, "hand-offs");
      expect(handoffs.body.handoffs.map((h: { version: number }) => h.version)).toEqual([2, 1]);
      await context.close();
    },
    flowTimeoutMs,
  );
});
