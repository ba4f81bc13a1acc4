import { apiRoutes, type HealthResponse } from "@spanwright/contracts";
import type { Router } from "express";

/** `GET /api/health`: 200 when the database answers, 503 when it does not. */
export function registerHealthRoutes(router: Router, ping: () => Promise<boolean>): void {
  router.get(apiRoutes.health.path, async (_req, res) => {
    const up = await ping();
    const body: HealthResponse = { status: up ? "ok" : "degraded", database: up ? "up" : "down" };
    res.status(up ? 200 : 503).json(body);
  });
}
