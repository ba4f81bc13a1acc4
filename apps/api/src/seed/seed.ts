import type { Role } from "@spanwright/contracts";
import type { Services } from "../app.js";
import { findUserByEmail } from "../auth/auth.repo.js";
import type { Db } from "../db/client.js";
import { mezzanineBeam, readingRoomRoofBeam, riverWallGradeBeam } from "./demoModels.js";

/** Development and demo only: printed by `npm start`, documented in the README. */
export const demoPassword = "spanwright-demo";
export const demoEmail = "demo@spanwright.test";
export const demoProjectName = "Millrace Library";

/** Invented people of the invented firms Kestrel Lane Engineers and Groundwork Partners. */
const team: Array<{ email: string; name: string; role: Exclude<Role, "owner"> }> = [
  { email: "tobias.fennick@kestrel-lane.test", name: "Tobias Fennick", role: "engineer" },
  { email: "ines.varga@kestrel-lane.test", name: "Ines Varga", role: "checker" },
  { email: "oluwaseun.brandt@groundwork.test", name: "Oluwaseun Brandt", role: "viewer" },
];

async function ensureUser(services: Services, db: Db, email: string, name: string): Promise<string> {
  const existing = await findUserByEmail(db, email);
  if (existing) return existing.id;
  const { user } = await services.auth.signUp({ email, name, password: demoPassword });
  return user.id;
}

/**
 * The demo account (project lead Mara Quillon, owner) and the Millrace Library project with three
 * beams, its team in every role, a second revision and a checked one. Idempotent: does nothing when
 * the demo account already has the project.
 */
export async function seedDemo(services: Services, db: Db): Promise<{ created: boolean }> {
  const ownerId = await ensureUser(services, db, demoEmail, "Mara Quillon");
  const existing = await services.projects.list(ownerId);
  if (existing.some((p) => p.name === demoProjectName)) return { created: false };

  const ids: Record<string, string> = {};
  for (const member of team) ids[member.role] = await ensureUser(services, db, member.email, member.name);

  const project = await services.projects.create(ownerId, { name: demoProjectName, unitSystem: "si", compareThresholdPercent: 5 });
  for (const member of team) await services.members.invite(ownerId, project.id, { email: member.email, role: member.role });

  const engineerId = ids.engineer!;
  const roof = await services.beams.create(engineerId, project.id, {
    name: "RB-2 reading room roof",
    model: readingRoomRoofBeam(-5_000),
    changeSummary: "First run from the architect's roof build-up",
  });
  await services.revisions.check(ids.checker!, project.id, roof.beam.id, 1, { comment: "Span moments agree with a hand check." });
  await services.revisions.save(engineerId, project.id, roof.beam.id, {
    baseVersion: 1,
    model: readingRoomRoofBeam(-6_000),
    changeSummary: "Roof live load raised to 6 kN/m for the planted terrace",
  });
  await services.beams.create(engineerId, project.id, {
    name: "GB-4 river wall grade beam",
    model: riverWallGradeBeam(),
    changeSummary: "Piles as springs, stiffness from the geotechnical memo",
  });
  await services.beams.create(ownerId, project.id, {
    name: "MB-1 stacks mezzanine",
    model: mezzanineBeam(),
    changeSummary: "Drop-in span on a hinge at the cantilever tip",
  });
  return { created: true };
}
