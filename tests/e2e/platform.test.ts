import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { findVerificationLink, uniqueEmail } from "@spanwright/api/testing";
import { flowTimeoutMs, setupTimeoutMs, startE2e, type E2eEnvironment } from "./harness";

// Issue 7, real-browser suite: sign-up, sign-in, a project, an invitation with a role, sign-out,
// all through the production build in Chromium.
let env: E2eEnvironment;
beforeAll(async () => {
  env = await startE2e("platform");
}, setupTimeoutMs);
afterAll(async () => {
  await env?.close();
}, setupTimeoutMs);

describe("the platform in a real browser", () => {
  it(
    "lets a lead sign up, create a project and invite an engineer who then signs up, confirms the e-mail and sees it",
    async () => {
      const lead = { name: "Rosalind Achterberg", email: uniqueEmail("rosalind"), password: "granite quarry lantern 42" };
      const invitee = { name: "Kofi Lindqvist", email: uniqueEmail("kofi"), password: "copper kettle harbour 17" };
      const projectName = "Tannery Row footbridge";

      const leadContext = await env.newContext();
      const page = await env.newPage(leadContext, "lead");

      // A signed-out visitor is sent to sign-in, and can go on to create an account there.
      await page.goto("/projects");
      await page.waitForURL((url) => url.pathname === "/sign-in");
      await page.getByRole("heading", { name: "Sign in" }).waitFor();
      await env.screenshot(page, "sign-in");
      await page.getByRole("link", { name: "Create an account" }).click();
      await page.getByRole("heading", { name: "Create your account" }).waitFor();

      // Sign-up, field by field, then straight into the (empty) workspace.
      await page.getByLabel("Full name").fill(lead.name);
      await page.getByLabel("E-mail").fill(lead.email);
      await page.getByLabel("Password").fill(lead.password);
      await env.screenshot(page, "sign-up");
      await page.getByRole("button", { name: "Create account" }).click();
      await page.waitForURL((url) => url.pathname === "/projects");
      await page.getByText("No projects yet").waitFor();

      // Sign out from the user menu, then sign in again with the new account.
      await page.getByRole("button", { name: lead.name }).click();
      await page.getByRole("button", { name: "Sign out" }).click();
      await page.waitForURL((url) => url.pathname === "/sign-in");
      await page.getByLabel("E-mail").fill(lead.email);
      await page.getByLabel("Password").fill("not the password at all");
      await page.getByRole("button", { name: "Sign in" }).click();
      await page.getByText("That e-mail and password do not match an account.").waitFor();
      await page.getByLabel("Password").fill(lead.password);
      await page.getByRole("button", { name: "Sign in" }).click();
      await page.waitForURL((url) => url.pathname === "/projects");

      // Create a project; the lead lands on its page as its owner.
      const newProject = page.getByRole("form", { name: "New project" });
      await newProject.getByLabel("Project name").fill(projectName);
      await newProject.getByLabel("Units").selectOption("si");
      await newProject.getByRole("button", { name: "Create project" }).click();
      await page.waitForURL(/\/projects\/[^/]+$/);
      await page.getByRole("heading", { level: 1, name: projectName }).waitFor();
      await page.getByText("You: Project lead").waitFor();
      const projectPath = new URL(page.url()).pathname;
      await env.screenshot(page, "project");

      // Invite someone who has no account yet, as an engineer.
      await page.getByRole("link", { name: "Manage" }).click();
      await page.waitForURL((url) => url.pathname === `${projectPath}/members`);
      const invite = page.getByRole("form", { name: "Invite a member" });
      await invite.getByLabel("E-mail").fill(invitee.email);
      await invite.getByLabel("Role").selectOption({ label: "Engineer" });
      await invite.getByRole("button", { name: "Invite" }).click();
      await page.getByText(`${invitee.email} was added. They will see the project once they create an account with that e-mail and confirm it from the link we send.`).waitFor();
      await env.screenshot(page, "members");

      // The lead signs out; the user menu is gone and protected pages send back to sign-in.
      await page.getByRole("button", { name: lead.name }).click();
      await page.getByRole("button", { name: "Sign out" }).click();
      await page.waitForURL((url) => url.pathname === "/sign-in");
      await page.goto(projectPath);
      await page.waitForURL((url) => url.pathname === "/sign-in");
      await leadContext.close();

      // The invitee, in a browser of their own, signs up with the invited e-mail and finds the project.
      const inviteeContext = await env.newContext();
      const p2 = await env.newPage(inviteeContext, "invitee");
      await p2.goto("/sign-up");
      await p2.getByLabel("Full name").fill(invitee.name);
      await p2.getByLabel("E-mail").fill(invitee.email);
      await p2.getByLabel("Password").fill(invitee.password);
      await p2.getByRole("button", { name: "Create account" }).click();
      await p2.waitForURL((url) => url.pathname === "/projects");
      // Signing up proves nothing about the address: the project stays closed until the invitee
      // follows the link mailed to it (here from the local mail catcher).
      await p2.getByText("Check your e-mail to join the projects you were invited to").waitFor();
      await p2.getByText("No projects yet").waitFor();
      await env.screenshot(p2, "verify-banner");
      const link = await findVerificationLink(env.app.services.mailer, invitee.email);
      expect(link?.origin).toBe(env.baseUrl);
      await p2.goto(link!.pathname + link!.search);
      await p2.getByText("Your e-mail is confirmed").waitFor();
      await p2.getByRole("link", { name: "Go to your projects" }).click();
      await p2.waitForURL((url) => url.pathname === "/projects");
      const card = p2.getByRole("link", { name: new RegExp(projectName) });
      await card.waitFor();
      expect(await card.textContent()).toContain("Engineer");
      await env.screenshot(p2, "projects-invitee");
      await card.click();
      await p2.waitForURL((url) => url.pathname === projectPath);
      await p2.getByText("You: Engineer").waitFor();
      await p2.getByRole("form", { name: "New beam" }).waitFor();
      await inviteeContext.close();
    },
    flowTimeoutMs,
  );
});
