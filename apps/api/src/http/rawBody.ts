import type { IncomingMessage } from "node:http";
import type { Request } from "express";

const rawBodies = new WeakMap<IncomingMessage, string>();

/**
 * express.json's `verify` hook that keeps the JSON text of requests to the given paths, for routes
 * that hand the body on as text (the solve route gives it to a solver thread, which parses it
 * there). UTF-8 only, the JSON norm; other bodies are simply not kept.
 */
export function keepRawBodyFor(paths: readonly string[]): (req: IncomingMessage, res: unknown, body: Buffer, encoding: string) => void {
  const wanted = new Set(paths);
  return (req, _res, body, encoding) => {
    const path = ((req as Request).originalUrl ?? req.url ?? "").split("?")[0]!;
    if (wanted.has(path) && /^utf-?8$/i.test(encoding)) rawBodies.set(req, body.toString("utf8"));
  };
}

/** The kept JSON text of the request's body (see keepRawBodyFor), if any. */
export function rawBodyOf(req: IncomingMessage): string | undefined {
  return rawBodies.get(req);
}
