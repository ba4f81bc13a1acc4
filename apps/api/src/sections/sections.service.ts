import type { CreateSectionRequest, ProjectSection, UpdateSectionRequest } from "@spanwright/contracts";
import {
  propertiesOfValidShape,
  validateMaterial,
  validateSectionShape,
  type Material,
  type SectionShape,
} from "@spanwright/solver/design";
import { authorize } from "../access/access.js";
import { recordAudit } from "../audit/audit.repo.js";
import type { Clock } from "../clock.js";
import { inTransaction, type Db } from "../db/client.js";
import { AppError } from "../http/appError.js";
import { isUniqueViolation } from "../http/dbErrors.js";
import * as repo from "./sections.repo.js";

/** The shape with its engine-computed properties: what every response carries. */
export function withProperties(section: repo.StoredSection): ProjectSection {
  return { ...section, sectionProperties: propertiesOfValidShape(section.shape) };
}

function parseShape(input: unknown): SectionShape {
  const shape = validateSectionShape(input);
  if (!shape.ok) throw new AppError("invalid-section", shape.error.message, { field: `shape.${shape.error.field}` });
  return shape.value;
}

function parseMaterial(input: unknown): Material {
  const material = validateMaterial(input);
  if (!material.ok) throw new AppError("invalid-section", material.error.message, { field: `material.${material.error.field}` });
  return material.value;
}

async function uniqueName<T>(name: string | undefined, work: () => Promise<T>): Promise<T> {
  try {
    return await work();
  } catch (error) {
    if (isUniqueViolation(error, "project_sections_project_name_key")) {
      throw new AppError("name-taken", "the project already has a section with this name", { name });
    }
    throw error;
  }
}

export function createSectionsService(deps: { db: Db; clock: Clock }) {
  const { db, clock } = deps;

  async function requireSection(tx: Db, projectId: string, sectionId: string): Promise<repo.StoredSection> {
    const section = await repo.findSection(tx, projectId, sectionId);
    if (!section) throw new AppError("not-found", "section not found");
    return section;
  }

  return {
    requireSection,

    async list(actorId: string, projectId: string): Promise<ProjectSection[]> {
      await authorize(db, projectId, actorId, "read");
      return (await repo.listSections(db, projectId)).map(withProperties);
    },

    /** Read access, for the report: the section and its material as stored. */
    async get(actorId: string, projectId: string, sectionId: string): Promise<repo.StoredSection> {
      await authorize(db, projectId, actorId, "read");
      return requireSection(db, projectId, sectionId);
    },

    async create(actorId: string, projectId: string, input: CreateSectionRequest): Promise<ProjectSection> {
      await authorize(db, projectId, actorId, "edit");
      const shape = parseShape(input.shape);
      const material = parseMaterial(input.material);
      const id = await uniqueName(input.name, () =>
        inTransaction(db, async (tx) => {
          const sectionId = await repo.insertSection(tx, { projectId, name: input.name, shape, material, createdBy: actorId, now: clock.now() });
          await recordAudit(tx, { projectId, actorId, action: "section.created", details: { sectionId, name: input.name } });
          return sectionId;
        }),
      );
      return withProperties(await requireSection(db, projectId, id));
    },

    async update(actorId: string, projectId: string, sectionId: string, input: UpdateSectionRequest): Promise<ProjectSection> {
      await authorize(db, projectId, actorId, "edit");
      await requireSection(db, projectId, sectionId);
      const changes = {
        ...(input.name !== undefined ? { name: input.name } : {}),
        ...(input.shape !== undefined ? { shape: parseShape(input.shape) } : {}),
        ...(input.material !== undefined ? { material: parseMaterial(input.material) } : {}),
      };
      await uniqueName(input.name, () =>
        inTransaction(db, async (tx) => {
          await repo.updateSection(tx, sectionId, { ...changes, now: clock.now() });
          await recordAudit(tx, { projectId, actorId, action: "section.updated", details: { sectionId, fields: Object.keys(changes) } });
        }),
      );
      return withProperties(await requireSection(db, projectId, sectionId));
    },

    async remove(actorId: string, projectId: string, sectionId: string): Promise<void> {
      await authorize(db, projectId, actorId, "edit");
      const section = await requireSection(db, projectId, sectionId);
      await inTransaction(db, async (tx) => {
        await repo.deleteSection(tx, sectionId);
        await recordAudit(tx, { projectId, actorId, action: "section.deleted", details: { sectionId, name: section.name } });
      });
    },
  };
}

export type SectionsService = ReturnType<typeof createSectionsService>;
