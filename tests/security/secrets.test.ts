import { execFileSync } from "node:child_process";
import fs from "node:fs";
import path from "node:path";
import { fileURLToPath } from "node:url";
import { describe, expect, it } from "vitest";

/**
 * No secret in the repository: the tracked files carry no private key, cloud or forge token,
 * credentials in a URL, or password-like assignment in shipped code. Test code may hold made-up
 * passwords (they only ever reach throwaway databases); the demo account's password is documented
 * in apps/api/README.md and is the one allowed exception in shipped code.
 */
const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "../..");
const documentedDemoPassword = "spanwright-demo";

function trackedTextFiles(): Array<{ file: string; text: string }> {
  const files = execFileSync("git", ["ls-files", "-z"], { cwd: root, encoding: "utf8" }).split("\0").filter(Boolean);
  return files.flatMap((file) => {
    const full = path.join(root, file);
    if (!fs.existsSync(full) || fs.statSync(full).size > 2_000_000) return [];
    const buffer = fs.readFileSync(full);
    if (buffer.includes(0)) return [];
    return [{ file, text: buffer.toString("utf8") }];
  });
}

const isTestCode = (file: string) => /\.test\.tsx?$|\/testing\/|^tests\/|\/e2e\//.test(file);

/** Patterns assembled from parts so this file does not match itself. */
const everywhere: Array<[string, RegExp]> = [
  ["a private key", new RegExp(`-----BEGIN ([A-Z]+ )?${"PRIVATE"} KEY-----`)],
  ["an AWS access key", new RegExp(`\\b${"AKIA"}[0-9A-Z]{16}\\b`)],
  ["a GitHub token", new RegExp(`\\b${"gh"}[pousr]_[A-Za-z0-9]{36,}\\b`)],
  ["a Slack token", new RegExp(`\\b${"xox"}[abprs]-[A-Za-z0-9-]{10,}`)],
  ["an npm token", new RegExp(`\\b${"npm"}_[A-Za-z0-9]{36}\\b`)],
  ["credentials in a URL", /\b[a-z][a-z0-9+.-]*:\/\/[^\s/:@"'`]+:[^\s/@"'`$]{3,}@/i],
];
const shippedOnly: Array<[string, RegExp]> = [
  ["a password-like assignment", /\b[A-Za-z_]*(password|passwd|secret|api_?key|token|private_?key)[A-Za-z_]*"?\s*[:=]\s*["'`]([^"'`\s]{8,})["'`]/gi],
];

describe("secrets in tracked files", () => {
  const files = trackedTextFiles();

  it("reads the tracked files", () => {
    expect(files.length).toBeGreaterThan(100);
  });

  it.each(everywhere)("no file holds %s", (_label, pattern) => {
    const hits = files.filter(({ text }) => pattern.test(text)).map(({ file }) => file);
    expect(hits).toEqual([]);
  });

  it.each(shippedOnly)("no shipped code holds %s, except the documented demo password", (_label, pattern) => {
    const hits: string[] = [];
    for (const { file, text } of files.filter(({ file }) => !isTestCode(file) && !file.endsWith(".md"))) {
      for (const match of text.matchAll(pattern)) {
        if (match[2] !== documentedDemoPassword) hits.push(`${file}: ${match[0]}`);
      }
    }
    expect(hits).toEqual([]);
  });

  it("tracks no environment or key files", () => {
    const names = files.map(({ file }) => file).filter((f) => /(^|\/)\.env(\.|$)(?!example)|\.(pem|key|p12|pfx)$|(^|\/)id_(rsa|ed25519)/.test(f));
    expect(names).toEqual([]);
  });

  it("documents the demo password it allows", () => {
    expect(fs.readFileSync(path.join(root, "apps/api/README.md"), "utf8")).toContain(documentedDemoPassword);
  });
});
