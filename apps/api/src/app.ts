import cookieParser from "cookie-parser";
import express, { type Express, type RequestHandler, Router } from "express";
import { rateLimit } from "express-rate-limit";
import helmet from "helmet";
import { randomUUID } from "node:crypto";
import { pino, type Logger } from "pino";
import { pinoHttp } from "pino-http";
import { apiLimits, apiRoutes } from "@spanwright/contracts";
import { registerAuthRoutes } from "./auth/auth.routes.js";
import { createAuthService } from "./auth/auth.service.js";
import { createEmailVerificationService } from "./auth/emailVerification.js";
import { loadSession } from "./auth/sessionCookie.js";
import { registerBeamRoutes } from "./beams/beams.routes.js";
import { registerSectionRoutes } from "./sections/sections.routes.js";
import { createSectionsService } from "./sections/sections.service.js";
import { createBeamsService } from "./beams/beams.service.js";
import { systemClock, type Clock } from "./clock.js";
import type { Config } from "./config.js";
import type { Database } from "./db/client.js";
import { registerHealthRoutes } from "./health/health.routes.js";
import { AppError } from "./http/appError.js";
import { checkOrigin } from "./http/csrf.js";
import { keepRawBodyFor } from "./http/rawBody.js";
import { apiNotFound, errorHandler } from "./http/errorHandler.js";
import { registerMemberRoutes } from "./members/members.routes.js";
import { createMembersService } from "./members/members.service.js";
import { registerProjectRoutes } from "./projects/projects.routes.js";
import { createProjectsService } from "./projects/projects.service.js";
import { registerExportRoutes } from "./exports/exports.routes.js";
import { registerHandoffRoutes } from "./handoffs/handoffs.routes.js";
import { createHandoffsService } from "./handoffs/handoffs.service.js";
import { registerImportRoutes } from "./imports/imports.routes.js";
import { createImportsService } from "./imports/imports.service.js";
import { createMailer, type Mailer } from "./mail/mailer.js";
import { registerOutboxRoutes } from "./outbox/outbox.routes.js";
import { registerReactionRoutes } from "./revisions/reactions.routes.js";
import { createReactionsService } from "./revisions/reactions.service.js";
import { registerRevisionRoutes } from "./revisions/revisions.routes.js";
import { createRevisionsService } from "./revisions/revisions.service.js";
import type { Engine } from "./solve/engine.js";
import { compressResponses, serveWebApp } from "./webApp.js";
import { registerSolveRoutes } from "./solve/solve.routes.js";

export interface AppDeps {
  config: Config;
  database: Database;
  engine: Engine;
  clock?: Clock;
  logger?: Logger;
  /** Hand-off mail; default from `config.mail` (the local catcher outside production). The app's owner closes it. */
  mailer?: Mailer;
}

export function createServices(deps: { database: Database; engine: Engine; clock: Clock; mailer: Mailer; publicUrl: string; logger?: Logger }) {
  const { database, engine, clock, mailer } = deps;
  const db = database.db;
  const emailVerification = createEmailVerificationService({ db, clock, mailer, publicUrl: deps.publicUrl, ...(deps.logger ? { logger: deps.logger } : {}) });
  const auth = createAuthService({ db, clock, emailVerification });
  const beams = createBeamsService({ db, clock, engine });
  const revisions = createRevisionsService({ db, clock, engine, beams });
  return {
    auth,
    emailVerification,
    projects: createProjectsService({ db, clock }),
    members: createMembersService({ db }),
    beams,
    sections: createSectionsService({ db, clock }),
    revisions,
    reactions: createReactionsService({ db }),
    imports: createImportsService({ db, beams, revisions }),
    handoffs: createHandoffsService({ db, clock, beams, mailer, publicUrl: deps.publicUrl, ...(deps.logger ? { logger: deps.logger } : {}) }),
    mailer,
  };
}

export type Services = ReturnType<typeof createServices>;

function authRateLimiter(config: Config): RequestHandler {
  return rateLimit({
    windowMs: config.authRateWindowMs,
    limit: config.authRateLimit,
    standardHeaders: "draft-8",
    legacyHeaders: false,
    handler: (_req, _res, next) => next(new AppError("rate-limited", "too many attempts; wait a few minutes and try again")),
  });
}

/** Every `/api` route, on one router with full paths (the route-table test walks it). */
function createApiRouter(deps: AppDeps, services: Services): Router {
  const { config, database } = deps;
  const router = Router();
  registerHealthRoutes(router, () => database.ping());
  router.use("/api", loadSession(services.auth, config.sessionCookieName));
  registerAuthRoutes(router, {
    auth: services.auth,
    emailVerification: services.emailVerification,
    cookieName: config.sessionCookieName,
    authRateLimit: authRateLimiter(config),
  });
  registerSolveRoutes(router, deps.engine);
  registerProjectRoutes(router, services.projects);
  registerMemberRoutes(router, services.members);
  registerImportRoutes(router, services.imports);
  registerBeamRoutes(router, services.beams);
  registerSectionRoutes(router, services.sections);
  // compare first: "…/revisions/compare" must not be read as a version
  registerReactionRoutes(router, services.reactions);
  registerRevisionRoutes(router, services.revisions);
  registerExportRoutes(router, database.db, services.sections);
  registerHandoffRoutes(router, services.handoffs);
  registerOutboxRoutes(router, { db: database.db, mailer: services.mailer, enabled: config.outboxEnabled });
  return router;
}

/** The Express app, without listening: tests drive it through supertest. */
export function createApp(deps: AppDeps): { app: Express; services: Services; apiRouter: Router } {
  const { config } = deps;
  const clock = deps.clock ?? systemClock;
  const logger = deps.logger ?? pino({ level: config.logLevel });
  const mailer = deps.mailer ?? createMailer(config.mail);
  const services = createServices({ database: deps.database, engine: deps.engine, clock, mailer, publicUrl: config.publicUrl, logger });

  const app = express();
  app.disable("x-powered-by");
  app.set("trust proxy", config.trustProxy);
  // no upgrade-insecure-requests: the product is served over plain http on 127.0.0.1 by default
  app.use(compressResponses);
  app.use(helmet({ contentSecurityPolicy: { directives: { upgradeInsecureRequests: null } } }));
  app.use(
    pinoHttp({
      logger,
      genReqId: (req, res) => {
        const incoming = req.headers["x-request-id"];
        const id = typeof incoming === "string" && /^[\w-]{1,64}$/.test(incoming) ? incoming : randomUUID();
        res.setHeader("X-Request-Id", id);
        return id;
      },
      // method, path and status only: never headers (cookies) or bodies (passwords)
      serializers: {
        req: (req: { id: unknown; method: string; url: string }) => ({ id: req.id, method: req.method, url: req.url.split("?")[0] }),
        res: (res: { statusCode: number }) => ({ statusCode: res.statusCode }),
      },
    }),
  );

  const apiRouter = createApiRouter(deps, services);
  app.use(
    "/api",
    cookieParser(),
    checkOrigin({ allowedOrigins: config.allowedOrigins, sessionCookieName: config.sessionCookieName }),
    express.json({ limit: apiLimits.bodyBytes, verify: keepRawBodyFor([apiRoutes.solve.path]) }),
  );
  app.use(apiRouter);
  app.use("/api", apiNotFound);
  if (config.serveWeb) serveWebApp(app, config.webDistDir);
  app.use(errorHandler);
  return { app, services, apiRouter };
}
