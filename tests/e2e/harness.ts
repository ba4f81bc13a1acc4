import fs from "node:fs";
import os from "node:os";
import type { Server } from "node:http";
import path from "node:path";
import { fileURLToPath } from "node:url";
import { chromium, type Browser, type BrowserContext, type Page } from "playwright-core";
import { onTestFailed } from "vitest";
import { createTestApp, type Client, type TestApp } from "@spanwright/api/testing";
import { freePort } from "../freePort";

/*
 * One real-browser environment per test file: a fresh database copied from the run's template, the
 * production app (built web app served by the API on one port, local mail catcher and outbox on,
 * as `npm start` runs it) on 127.0.0.1 with a port chosen by the OS, and Debian's Chromium driven
 * headless by playwright-core. Nothing is downloaded: the browser is the system package that
 * `scripts/bootstrap.sh --browser` installs.
 */

const here = path.dirname(fileURLToPath(import.meta.url));
export const screenshotDir = path.resolve(here, "../../test-results/screenshots");
export const chromiumPath = process.env.SPANWRIGHT_CHROMIUM ?? "/usr/bin/chromium";

const chromiumArgs = [
  "--no-sandbox",
  "--disable-gpu",
  "--disable-quic",
  "--no-first-run",
  "--disable-background-networking",
  "--disable-component-update",
  "--disable-sync",
];

/** Generous waits: the machine is small and shared, and the first editor paint loads Konva and the engine. */
export const uiTimeoutMs = 30_000;
export const flowTimeoutMs = 150_000;
/** Start (database copy, server, Chromium, seeding with argon2 sign-ups) and stop of one file. */
export const setupTimeoutMs = 120_000;

export interface SeededUser {
  userId: string;
  name: string;
  email: string;
  password: string;
  /** An API client holding this user's session, for seeding through the API. */
  client: Client;
}

export interface E2eEnvironment {
  baseUrl: string;
  app: TestApp;
  browser: Browser;
  /** A fresh browser profile (cookies, local storage) with the app's origin as base URL. */
  newContext(): Promise<BrowserContext>;
  /** A new page of `context`; when the running test fails, its last screen is saved as failed-<name>. */
  newPage(context: BrowserContext, name: string): Promise<Page>;
  /** Signs up through the API (not the UI) and returns the credentials with a session client. */
  signUp(name: string, email?: string): Promise<SeededUser>;
  /** Saves a full-page PNG under test-results/screenshots/<file>-<name>.png. */
  screenshot(page: Page, name: string): Promise<void>;
  close(): Promise<void>;
}


function listen(testApp: TestApp, port: number): Promise<Server> {
  return new Promise((resolve, reject) => {
    const server = testApp.app.listen(port, "127.0.0.1", () => resolve(server));
    server.once("error", reject);
  });
}

function closeServer(server: Server): Promise<void> {
  return new Promise((resolve, reject) => {
    server.closeAllConnections();
    server.close((error) => (error ? reject(error) : resolve()));
  });
}

/**
 * Starts everything for one test file. `prefix` names the file's screenshots. Whatever was started
 * is stopped by close(), also when a later step of the start failed.
 */
export async function startE2e(prefix: string): Promise<E2eEnvironment> {
  const stops: Array<() => Promise<void>> = [];
  const stopAll = async () => {
    const errors: unknown[] = [];
    for (const stop of stops.reverse()) {
      try {
        await stop();
      } catch (error) {
        errors.push(error);
      }
    }
    stops.length = 0;
    if (errors.length > 0) throw new AggregateError(errors, "e2e teardown failed");
  };

  try {
    const webDist = snapshotWebDist(path.resolve(here, "../../apps/web/dist"));
    stops.push(async () => fs.rmSync(webDist, { recursive: true, force: true }));
    // The port is chosen first so hand-off mail links (PUBLIC_URL) point at this very server.
    const port = await freePort();
    const baseUrl = `http://127.0.0.1:${port}`;
    const app = await createTestApp({
      env: {
        PUBLIC_URL: baseUrl,
        NODE_ENV: "production",
        SERVE_WEB: "true",
        WEB_DIST_DIR: webDist,
        SMTP_MODE: "catcher",
        SMTP_PORT: "0",
        OUTBOX_ENABLED: "true",
      },
    });
    stops.push(() => app.close());
    const server = await listen(app, port);
    stops.push(() => closeServer(server));

    if (!fs.existsSync(chromiumPath)) {
      throw new Error(`no Chromium at ${chromiumPath}; install it with: bash scripts/bootstrap.sh --browser`);
    }
    const browser = await chromium.launch({ executablePath: chromiumPath, headless: true, args: chromiumArgs });
    stops.push(() => browser.close());
    fs.mkdirSync(screenshotDir, { recursive: true });

    return {
      baseUrl,
      app,
      browser,
      async newContext() {
        const context = await browser.newContext({ baseURL: baseUrl, viewport: { width: 1400, height: 1000 } });
        context.setDefaultTimeout(uiTimeoutMs);
        return context;
      },
      async newPage(context, name) {
        const page = await context.newPage();
        onTestFailed(async () => {
          if (!page.isClosed()) await page.screenshot({ path: path.join(screenshotDir, `${prefix}-failed-${name}.png`), fullPage: true });
        });
        return page;
      },
      async signUp(name, email) {
        const user = await app.signUp(name, email);
        return { userId: user.userId, name, email: user.email, password: user.password, client: user.client };
      },
      async screenshot(page, name) {
        await page.screenshot({ path: path.join(screenshotDir, `${prefix}-${name}.png`), fullPage: true });
      },
      close: stopAll,
    };
  } catch (error) {
    await stopAll().catch(() => {});
    throw error;
  }
}

/**
 * A private copy of the built web app (without source maps). Others rebuild apps/web/dist while
 * tests run; a page loaded before a rebuild would then ask for chunks that no longer exist.
 */
function snapshotWebDist(distDir: string): string {
  const indexHtml = path.join(distDir, "index.html");
  if (!fs.existsSync(indexHtml)) {
    throw new Error(`the web app is not built (${indexHtml}); run: pnpm --filter @spanwright/web build`);
  }
  for (let attempt = 1; ; attempt++) {
    const copy = fs.mkdtempSync(path.join(os.tmpdir(), "spanwright-e2e-web-"));
    fs.cpSync(distDir, copy, { recursive: true, filter: (source) => !source.endsWith(".map") });
    if (referencedAssetsExist(copy)) return copy;
    fs.rmSync(copy, { recursive: true, force: true });
    if (attempt === 3) throw new Error(`${distDir} keeps changing (a build is running?); run the tests again when it is done`);
  }
}

/** Whether every script and stylesheet index.html names is in the copy (false: copied mid-build). */
function referencedAssetsExist(dir: string): boolean {
  const indexHtml = path.join(dir, "index.html");
  if (!fs.existsSync(indexHtml)) return false;
  const html = fs.readFileSync(indexHtml, "utf8");
  const assets = [...html.matchAll(/(?:src|href)="\/([^"]+\.(?:js|css))"/g)].map((m) => m[1]!);
  return assets.every((asset) => fs.existsSync(path.join(dir, asset)));
}

/** Signs in through the sign-in form and waits for the projects page (or the `next` page). */
export async function signInThroughForm(page: Page, user: { email: string; password: string }, next = "/projects"): Promise<void> {
  await page.goto(`/sign-in?next=${encodeURIComponent(next)}`);
  await page.getByLabel("E-mail").fill(user.email);
  await page.getByLabel("Password").fill(user.password);
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.waitForURL((url) => url.pathname === next);
}

/** Throws with the API's error body when a seeding call did not answer the expected status. */
export function expectStatus<T extends { status: number; body: unknown }>(res: T, status: number, what: string): T {
  if (res.status !== status) throw new Error(`${what}: expected ${status}, got ${res.status} ${JSON.stringify(res.body)}`);
  return res;
}
