import { apiRoutes } from "@spanwright/contracts";
import type { Router } from "express";
import { requireAuth } from "../auth/sessionCookie.js";
import { rawBodyOf } from "../http/rawBody.js";
import { runSolverJson, type Engine } from "./engine.js";

/**
 * Stateless `POST /api/solve`: the body is a model, the answer the result (200) or the solver's
 * error (422) as `{ error: { code, message, where, details: { where } } }`; `where` sits at the top
 * level too, as the exchange format's error object has it.
 */
export function registerSolveRoutes(router: Router, engine: Engine): void {
  router.post(apiRoutes.solve.path, async (req, res) => {
    requireAuth(res);
    const json = await runSolverJson(engine, req.body, { json: rawBodyOf(req) });
    // The solver thread already wrote the JSON: send it as it is rather than parse and re-serialise,
    // and without res.send's ETag (a hash of the whole answer, of no use to a POST).
    res.status(200).type("application/json").setHeader("Content-Length", Buffer.byteLength(json));
    res.end(json);
  });
}
