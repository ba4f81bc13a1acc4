import type { Express } from "express";
import request from "supertest";

/** The Origin every test client sends: allowed by the test config, so CSRF checks pass. */
export const testOrigin = "http://spanwright.test";

type Method = "get" | "post" | "patch" | "delete";

/**
 * A browser-like client: keeps cookies like a browser and sends this site's Origin on every request,
 * as browsers do on state-changing requests.
 */
export class Client {
  readonly agent: ReturnType<typeof request.agent>;
  constructor(app: Express, readonly origin: string = testOrigin) {
    this.agent = request.agent(app);
  }

  send(method: Method, path: string, body?: unknown) {
    const req = this.agent[method](path).set("Origin", this.origin);
    return body === undefined ? req : req.send(body as object);
  }
  get(path: string) {
    return this.send("get", path);
  }
  post(path: string, body?: unknown) {
    return this.send("post", path, body ?? {});
  }
  patch(path: string, body?: unknown) {
    return this.send("patch", path, body ?? {});
  }
  delete(path: string) {
    return this.send("delete", path);
  }
}
