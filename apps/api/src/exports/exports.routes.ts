import { apiRoutes, reactionCsvQuerySchema, reportQuerySchema } from "@spanwright/contracts";
import type { Response, Router } from "express";
import { parseId } from "../access/access.js";
import { requireAuth } from "../auth/sessionCookie.js";
import type { Db } from "../db/client.js";
import { parseRequest } from "../http/validate.js";
import { loadRevisionContext } from "../revisions/revisionContext.js";
import { parseVersion } from "../revisions/revisions.routes.js";
import type { SectionsService } from "../sections/sections.service.js";
import { reportChecks } from "./reportChecks.js";
import { revisionCsv, revisionPdf, type RevisionFile } from "./revisionFiles.js";

function sendAttachment(res: Response, file: RevisionFile): void {
  res.attachment(file.filename);
  res.type(file.contentType);
  // exports are snapshots of an immutable revision, but project names and units may change
  res.setHeader("Cache-Control", "private, no-cache");
  res.send(file.content);
}

/** CSV and PDF downloads of one revision (members read). */
export function registerExportRoutes(router: Router, db: Db, sections: SectionsService): void {
  const idsOf = (params: Record<string, string | undefined>) => ({
    projectId: parseId(params.projectId, "project"),
    beamId: parseId(params.beamId, "beam"),
    version: parseVersion(params.version),
  });

  router.get(apiRoutes.getReactionsCsv.path, async (req, res) => {
    const { user } = requireAuth(res);
    const ids = idsOf(req.params);
    const query = parseRequest(reactionCsvQuerySchema, req.query, "query");
    sendAttachment(res, revisionCsv(await loadRevisionContext(db, user.id, ids), query.units));
  });

  router.get(apiRoutes.getReportPdf.path, async (req, res) => {
    const { user } = requireAuth(res);
    const ids = idsOf(req.params);
    const query = parseRequest(reportQuerySchema, req.query, "query");
    const ctx = await loadRevisionContext(db, user.id, ids);
    sendAttachment(res, await revisionPdf(ctx, await reportChecks(db, sections, user.id, ctx, query)));
  });
}
