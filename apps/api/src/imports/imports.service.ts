import type { BeamResponse, LoadSchedulePreviewResponse, Revision } from "@spanwright/contracts";
import { applyLoadSchedule, parseLoadSchedule, type LoadScheduleResult } from "@spanwright/handoff";
import { authorize } from "../access/access.js";
import type { BeamsService } from "../beams/beams.service.js";
import type { Db } from "../db/client.js";
import { AppError } from "../http/appError.js";
import { asBeamModel } from "../revisions/revisionContext.js";
import { findRevision } from "../revisions/revisions.repo.js";
import type { RevisionsService } from "../revisions/revisions.service.js";
import type { UploadedFile } from "./upload.js";

const MAX_NAME = 120;

/** The beam's name: the typed one, else the model's title, else the file name without extension. */
function beamName(typed: string | undefined, model: Record<string, unknown>, file: UploadedFile): string {
  const title = typeof model.title === "string" ? model.title : "";
  const fromFile = file.originalName.replace(/\.[^.]*$/, "");
  const name = [typed, title, fromFile, "Imported beam"].map((s) => (s ?? "").trim()).find((s) => s.length > 0)!;
  return name.slice(0, MAX_NAME);
}

/** Uploads: a beam model in the exchange format, and load schedules (CSV) previewed or applied. */
export function createImportsService(deps: { db: Db; beams: BeamsService; revisions: RevisionsService }) {
  const { db, beams, revisions } = deps;

  async function scheduleAgainst(beamId: string, version: number, file: UploadedFile): Promise<LoadScheduleResult> {
    const revision = await findRevision(db, beamId, version);
    if (!revision) throw new AppError("not-found", "revision not found");
    // cases not in the beam are created (category "other"); the preview says which
    return parseLoadSchedule(file.text, asBeamModel(revision.model), { unknownCase: "create" });
  }

  return {
    /** Checked before the upload is read, so a caller without the right never sends a file in. */
    async authorizeEdit(actorId: string, projectId: string, beamId?: string): Promise<void> {
      await authorize(db, projectId, actorId, "edit");
      if (beamId) await beams.requireBeam(db, projectId, beamId);
    },

    /** A new beam from an exchange-format file; the solver validates the model (422 as for any save). */
    async importBeam(actorId: string, projectId: string, file: UploadedFile, typedName?: string): Promise<BeamResponse> {
      let model: unknown;
      try {
        model = JSON.parse(file.text);
      } catch (error) {
        throw new AppError("invalid-file", `the file is not valid JSON: ${(error as Error).message}`);
      }
      if (!model || typeof model !== "object" || Array.isArray(model)) {
        throw new AppError("invalid-file", "the file must hold one beam model object (spanwright.beam/1)");
      }
      const json = model as Record<string, unknown>;
      if (json.format !== "spanwright.beam/1") {
        throw new AppError("invalid-file", `the file is not a Spanwright beam (format "spanwright.beam/1"), found ${JSON.stringify(json.format ?? null)}`);
      }
      return beams.create(actorId, projectId, {
        name: beamName(typedName, json, file),
        model: json,
        changeSummary: `Imported from ${file.originalName}`.slice(0, 2000),
      });
    },

    /** Row-by-row check of a load schedule against the beam's latest revision; writes nothing. */
    async previewSchedule(actorId: string, projectId: string, beamId: string, file: UploadedFile): Promise<LoadSchedulePreviewResponse> {
      await authorize(db, projectId, actorId, "edit");
      const beam = await beams.requireBeam(db, projectId, beamId);
      const parsed = await scheduleAgainst(beamId, beam.latestVersion, file);
      return parsed as unknown as LoadSchedulePreviewResponse;
    },

    /**
     * Adds the schedule's loads on top of `baseVersion` as a new revision, only when every row is
     * valid (else 422 `invalid-schedule` with the rows, nothing written). A stale base is 409.
     */
    async applySchedule(actorId: string, projectId: string, beamId: string, baseVersion: number, file: UploadedFile): Promise<Revision> {
      await authorize(db, projectId, actorId, "edit");
      await beams.requireBeam(db, projectId, beamId);
      const parsed = await scheduleAgainst(beamId, baseVersion, file);
      if (!parsed.ok) {
        throw new AppError("invalid-schedule", `the load schedule has ${parsed.errors.length} error(s); nothing was applied`, { errors: parsed.errors });
      }
      const base = await findRevision(db, beamId, baseVersion);
      if (!base) throw new AppError("not-found", "revision not found");
      const model = applyLoadSchedule(asBeamModel(base.model), parsed.preview);
      return revisions.save(actorId, projectId, beamId, {
        baseVersion,
        model: model as unknown as Record<string, unknown>,
        changeSummary: `Load schedule ${file.originalName}`.slice(0, 200),
      });
    },
  };
}

export type ImportsService = ReturnType<typeof createImportsService>;
