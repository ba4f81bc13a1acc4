import { sql } from "drizzle-orm";
import {
  boolean,
  check,
  index,
  integer,
  jsonb,
  pgTable,
  primaryKey,
  real,
  text,
  timestamp,
  uniqueIndex,
  uuid,
} from "drizzle-orm/pg-core";

const createdAt = () => timestamp("created_at", { withTimezone: true }).notNull().defaultNow();

export const users = pgTable(
  "users",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    /** Stored lower-cased and trimmed. */
    email: text("email").notNull(),
    name: text("name").notNull(),
    /** argon2id PHC string; null for a placeholder created by an invitation, until sign-up. */
    passwordHash: text("password_hash"),
    /**
     * When the owner of the address proved it (followed the mailed link), or when the account was
     * created by signing up with a new address (nothing to protect). Null for a placeholder and for
     * an account that took one over until it verifies: its invitations stay closed until then.
     */
    emailVerifiedAt: timestamp("email_verified_at", { withTimezone: true }),
    createdAt: createdAt(),
  },
  (t) => [
    uniqueIndex("users_email_key").on(t.email),
    check("users_email_lower", sql`${t.email} = lower(${t.email})`),
  ],
);

/** Lucia-style sessions: `id` is the hex SHA-256 of the token in the cookie, never the token. */
export const sessions = pgTable(
  "sessions",
  {
    id: text("id").primaryKey(),
    userId: uuid("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    expiresAt: timestamp("expires_at", { withTimezone: true }).notNull(),
    createdAt: createdAt(),
  },
  (t) => [index("sessions_user_id_idx").on(t.userId)],
);

export const projects = pgTable(
  "projects",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    name: text("name").notNull(),
    unitSystem: text("unit_system", { enum: ["si", "us"] }).notNull().default("si"),
    compareThresholdPercent: real("compare_threshold_percent").notNull().default(5),
    createdAt: createdAt(),
    updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    check("projects_unit_system_check", sql`${t.unitSystem} in ('si', 'us')`),
    check(
      "projects_compare_threshold_check",
      sql`${t.compareThresholdPercent} >= 0 and ${t.compareThresholdPercent} <= 100`,
    ),
    check("projects_name_check", sql`length(${t.name}) between 1 and 120`),
  ],
);

export const projectMembers = pgTable(
  "project_members",
  {
    projectId: uuid("project_id")
      .notNull()
      .references(() => projects.id, { onDelete: "cascade" }),
    userId: uuid("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    role: text("role", { enum: ["owner", "engineer", "checker", "viewer"] }).notNull(),
    /**
     * Added by an owner's invitation of an e-mail address: counts only once the user's address is
     * verified (`users.email_verified_at`). False for the project's creator, who needs no proof.
     */
    invited: boolean("invited").notNull().default(true),
    createdAt: createdAt(),
  },
  (t) => [
    primaryKey({ name: "project_members_pkey", columns: [t.projectId, t.userId] }),
    index("project_members_user_id_idx").on(t.userId),
    check("project_members_role_check", sql`${t.role} in ('owner', 'engineer', 'checker', 'viewer')`),
  ],
);

export const beams = pgTable(
  "beams",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    projectId: uuid("project_id")
      .notNull()
      .references(() => projects.id, { onDelete: "cascade" }),
    name: text("name").notNull(),
    /** Denormalised latest revision number: the optimistic-concurrency check compares against it. */
    latestVersion: integer("latest_version").notNull(),
    /**
     * The design choices of the member checks (`BeamDesignSettings` of @spanwright/contracts, SI),
     * validated by the service before they are stored; null until first saved. Not part of any
     * revision: the report of an old revision prints them against that revision's model.
     */
    designSettings: jsonb("design_settings"),
    createdAt: createdAt(),
    updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    index("beams_project_id_idx").on(t.projectId),
    check("beams_latest_version_check", sql`${t.latestVersion} >= 1`),
    check("beams_name_check", sql`length(${t.name}) between 1 and 120`),
  ],
);

export const beamRevisions = pgTable(
  "beam_revisions",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    beamId: uuid("beam_id")
      .notNull()
      .references(() => beams.id, { onDelete: "cascade" }),
    version: integer("version").notNull(),
    /** The beam in the exchange format `spanwright.beam/1`. */
    model: jsonb("model").notNull(),
    authorId: uuid("author_id")
      .notNull()
      .references(() => users.id, { onDelete: "restrict" }),
    changeSummary: text("change_summary").notNull().default(""),
    status: text("status", { enum: ["draft", "checked", "issued"] }).notNull().default("draft"),
    checkedById: uuid("checked_by").references(() => users.id, { onDelete: "restrict" }),
    checkedAt: timestamp("checked_at", { withTimezone: true }),
    checkComment: text("check_comment"),
    createdAt: createdAt(),
  },
  (t) => [
    uniqueIndex("beam_revisions_beam_version_key").on(t.beamId, t.version),
    index("beam_revisions_author_id_idx").on(t.authorId),
    index("beam_revisions_checked_by_idx").on(t.checkedById),
    check("beam_revisions_version_check", sql`${t.version} >= 1`),
    check("beam_revisions_status_check", sql`${t.status} in ('draft', 'checked', 'issued')`),
    // a draft has no checker; a checked revision records who checked it and when; an issued one
    // may have been checked first or issued straight from draft (the hand-off makes it immutable)
    check(
      "beam_revisions_checked_check",
      sql`(${t.status} <> 'draft' or (${t.checkedById} is null and ${t.checkedAt} is null)) and (${t.status} <> 'checked' or (${t.checkedById} is not null and ${t.checkedAt} is not null))`,
    ),
  ],
);

/** The solver's output for a revision, 1:1, written in the same transaction as the revision. */
export const revisionResults = pgTable("revision_results", {
  revisionId: uuid("revision_id")
    .primaryKey()
    .references(() => beamRevisions.id, { onDelete: "cascade" }),
  /** The result in the exchange format `spanwright.result/1`. */
  result: jsonb("result").notNull(),
  createdAt: createdAt(),
});

export const auditEvents = pgTable(
  "audit_events",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    /** Kept (as null) when the project is deleted, so the deletion itself stays on record. */
    projectId: uuid("project_id").references(() => projects.id, { onDelete: "set null" }),
    actorId: uuid("actor_id").references(() => users.id, { onDelete: "set null" }),
    action: text("action").notNull(),
    details: jsonb("details").notNull().default({}),
    createdAt: createdAt(),
  },
  (t) => [
    index("audit_events_project_id_idx").on(t.projectId, t.createdAt),
    index("audit_events_actor_id_idx").on(t.actorId),
  ],
);

/**
 * A revision's reaction table e-mailed to the foundation designer. Written only after the SMTP
 * server accepted the message, so every row stands for a mail that left (`message_id`).
 */
export const handoffs = pgTable(
  "handoffs",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    projectId: uuid("project_id")
      .notNull()
      .references(() => projects.id, { onDelete: "cascade" }),
    beamId: uuid("beam_id")
      .notNull()
      .references(() => beams.id, { onDelete: "cascade" }),
    revisionId: uuid("revision_id")
      .notNull()
      .references(() => beamRevisions.id, { onDelete: "cascade" }),
    issuedById: uuid("issued_by")
      .notNull()
      .references(() => users.id, { onDelete: "restrict" }),
    message: text("message"),
    messageId: text("message_id").notNull(),
    createdAt: createdAt(),
  },
  (t) => [
    index("handoffs_project_id_idx").on(t.projectId, t.createdAt),
    index("handoffs_beam_id_idx").on(t.beamId, t.createdAt),
    index("handoffs_revision_id_idx").on(t.revisionId),
    index("handoffs_issued_by_idx").on(t.issuedById),
  ],
);

/** Who received a hand-off: an address, and the member it belonged to when it was sent. */
export const handoffRecipients = pgTable(
  "handoff_recipients",
  {
    handoffId: uuid("handoff_id")
      .notNull()
      .references(() => handoffs.id, { onDelete: "cascade" }),
    /** Lower-cased, as sent. */
    email: text("email").notNull(),
    userId: uuid("user_id").references(() => users.id, { onDelete: "set null" }),
  },
  (t) => [
    primaryKey({ name: "handoff_recipients_pkey", columns: [t.handoffId, t.email] }),
    index("handoff_recipients_user_id_idx").on(t.userId),
  ],
);

/**
 * Project sections (issue 6): a named cross-section and material reused across the project's
 * beams. `shape` is a `SectionShape` and `material` a `Material` of @spanwright/solver/design,
 * both SI and validated by the service before they are stored.
 */
export const projectSections = pgTable(
  "project_sections",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    projectId: uuid("project_id")
      .notNull()
      .references(() => projects.id, { onDelete: "cascade" }),
    name: text("name").notNull(),
    shape: jsonb("shape").notNull(),
    material: jsonb("material").notNull(),
    createdBy: uuid("created_by").references(() => users.id, { onDelete: "set null" }),
    createdAt: createdAt(),
    updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    uniqueIndex("project_sections_project_name_key").on(t.projectId, t.name),
    check("project_sections_name_check", sql`length(${t.name}) between 1 and 120`),
  ],
);

/**
 * One-time links that prove a user owns their e-mail address. `id` is the hex SHA-256 of the token
 * in the link, never the token (as for sessions); `email` is the address the link was sent to.
 */
export const emailVerifications = pgTable(
  "email_verifications",
  {
    id: text("id").primaryKey(),
    userId: uuid("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    email: text("email").notNull(),
    expiresAt: timestamp("expires_at", { withTimezone: true }).notNull(),
    createdAt: createdAt(),
  },
  (t) => [index("email_verifications_user_id_idx").on(t.userId)],
);
