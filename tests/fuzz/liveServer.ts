import type { TestApp } from "@spanwright/api/testing";
import type { AddressInfo } from "node:net";
import type { Server } from "node:http";

type Express = TestApp["app"];

/** The Origin the test config allows (see `testConfig`), sent like a browser would. */
const testOrigin = "http://spanwright.test";

export interface RawRequest {
  method: "GET" | "POST" | "PATCH" | "DELETE";
  path: string;
  /** Sent as is: lets a test send text that is not JSON, or JSON with literals like 1e999. */
  body?: string;
  contentType?: string;
  cookie?: string;
  timeoutMs?: number;
}

export interface RawResponse {
  status: number;
  /** Parsed JSON, or null when the body was not JSON. */
  json: unknown;
  text: string;
  headers: Headers;
}

export interface LiveServer {
  baseUrl: string;
  send(request: RawRequest): Promise<RawResponse>;
  close(): Promise<void>;
}

/**
 * The app on a real HTTP server on 127.0.0.1, port chosen by the OS. Node's fetch keeps connections
 * alive, so ten thousand requests cost milliseconds each rather than a connection each; every
 * request has a deadline, so a hung handler fails the test instead of stalling it.
 */
export async function startLiveServer(app: Express): Promise<LiveServer> {
  const server: Server = await new Promise((resolve) => {
    const s = app.listen(0, "127.0.0.1", () => resolve(s));
  });
  const { port } = server.address() as AddressInfo;
  const baseUrl = `http://127.0.0.1:${port}`;
  return {
    baseUrl,
    async send({ method, path, body, contentType = "application/json", cookie, timeoutMs = 10_000 }) {
      const headers: Record<string, string> = { Origin: testOrigin };
      if (body !== undefined) headers["Content-Type"] = contentType;
      if (cookie) headers.Cookie = cookie;
      const res = await fetch(`${baseUrl}${path}`, { method, headers, body, signal: AbortSignal.timeout(timeoutMs) });
      const text = await res.text();
      let json: unknown = null;
      try {
        json = JSON.parse(text);
      } catch {
        json = null;
      }
      return { status: res.status, json, text, headers: res.headers };
    },
    close: () =>
      new Promise<void>((resolve, reject) => {
        server.closeAllConnections();
        server.close((error) => (error ? reject(error) : resolve()));
      }),
  };
}

/** The `name=value` pair of the session cookie from a response, for the Cookie header. */
export function sessionCookieOf(res: RawResponse, cookieName: string): string {
  const cookie = res.headers.getSetCookie().find((c) => c.startsWith(`${cookieName}=`));
  if (!cookie) throw new Error(`no ${cookieName} cookie in the response (status ${res.status})`);
  return cookie.split(";")[0]!;
}
