CREATE TABLE "audit_events" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"project_id" uuid,
	"actor_id" uuid,
	"action" text NOT NULL,
	"details" jsonb DEFAULT '{}'::jsonb NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "beam_revisions" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"beam_id" uuid NOT NULL,
	"version" integer NOT NULL,
	"model" jsonb NOT NULL,
	"author_id" uuid NOT NULL,
	"change_summary" text DEFAULT '' NOT NULL,
	"status" text DEFAULT 'draft' NOT NULL,
	"checked_by" uuid,
	"checked_at" timestamp with time zone,
	"check_comment" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "beam_revisions_version_check" CHECK ("beam_revisions"."version" >= 1),
	CONSTRAINT "beam_revisions_status_check" CHECK ("beam_revisions"."status" in ('draft', 'checked', 'issued')),
	CONSTRAINT "beam_revisions_checked_check" CHECK (("beam_revisions"."status" = 'draft') = ("beam_revisions"."checked_by" is null and "beam_revisions"."checked_at" is null))
);
--> statement-breakpoint
CREATE TABLE "beams" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"project_id" uuid NOT NULL,
	"name" text NOT NULL,
	"latest_version" integer NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "beams_latest_version_check" CHECK ("beams"."latest_version" >= 1),
	CONSTRAINT "beams_name_check" CHECK (length("beams"."name") between 1 and 120)
);
--> statement-breakpoint
CREATE TABLE "project_members" (
	"project_id" uuid NOT NULL,
	"user_id" uuid NOT NULL,
	"role" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "project_members_pkey" PRIMARY KEY("project_id","user_id"),
	CONSTRAINT "project_members_role_check" CHECK ("project_members"."role" in ('owner', 'engineer', 'checker', 'viewer'))
);
--> statement-breakpoint
CREATE TABLE "projects" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"name" text NOT NULL,
	"unit_system" text DEFAULT 'si' NOT NULL,
	"compare_threshold_percent" real DEFAULT 5 NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "projects_unit_system_check" CHECK ("projects"."unit_system" in ('si', 'us')),
	CONSTRAINT "projects_compare_threshold_check" CHECK ("projects"."compare_threshold_percent" >= 0 and "projects"."compare_threshold_percent" <= 100),
	CONSTRAINT "projects_name_check" CHECK (length("projects"."name") between 1 and 120)
);
--> statement-breakpoint
CREATE TABLE "revision_results" (
	"revision_id" uuid PRIMARY KEY NOT NULL,
	"result" jsonb NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "sessions" (
	"id" text PRIMARY KEY NOT NULL,
	"user_id" uuid NOT NULL,
	"expires_at" timestamp with time zone NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "users" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"email" text NOT NULL,
	"name" text NOT NULL,
	"password_hash" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "users_email_lower" CHECK ("users"."email" = lower("users"."email"))
);
--> statement-breakpoint
ALTER TABLE "audit_events" ADD CONSTRAINT "audit_events_project_id_projects_id_fk" FOREIGN KEY ("project_id") REFERENCES "public"."projects"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "audit_events" ADD CONSTRAINT "audit_events_actor_id_users_id_fk" FOREIGN KEY ("actor_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "beam_revisions" ADD CONSTRAINT "beam_revisions_beam_id_beams_id_fk" FOREIGN KEY ("beam_id") REFERENCES "public"."beams"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "beam_revisions" ADD CONSTRAINT "beam_revisions_author_id_users_id_fk" FOREIGN KEY ("author_id") REFERENCES "public"."users"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "beam_revisions" ADD CONSTRAINT "beam_revisions_checked_by_users_id_fk" FOREIGN KEY ("checked_by") REFERENCES "public"."users"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "beams" ADD CONSTRAINT "beams_project_id_projects_id_fk" FOREIGN KEY ("project_id") REFERENCES "public"."projects"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "project_members" ADD CONSTRAINT "project_members_project_id_projects_id_fk" FOREIGN KEY ("project_id") REFERENCES "public"."projects"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "project_members" ADD CONSTRAINT "project_members_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "revision_results" ADD CONSTRAINT "revision_results_revision_id_beam_revisions_id_fk" FOREIGN KEY ("revision_id") REFERENCES "public"."beam_revisions"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "sessions" ADD CONSTRAINT "sessions_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "audit_events_project_id_idx" ON "audit_events" USING btree ("project_id","created_at");--> statement-breakpoint
CREATE INDEX "audit_events_actor_id_idx" ON "audit_events" USING btree ("actor_id");--> statement-breakpoint
CREATE UNIQUE INDEX "beam_revisions_beam_version_key" ON "beam_revisions" USING btree ("beam_id","version");--> statement-breakpoint
CREATE INDEX "beam_revisions_author_id_idx" ON "beam_revisions" USING btree ("author_id");--> statement-breakpoint
CREATE INDEX "beam_revisions_checked_by_idx" ON "beam_revisions" USING btree ("checked_by");--> statement-breakpoint
CREATE INDEX "beams_project_id_idx" ON "beams" USING btree ("project_id");--> statement-breakpoint
CREATE INDEX "project_members_user_id_idx" ON "project_members" USING btree ("user_id");--> statement-breakpoint
CREATE INDEX "sessions_user_id_idx" ON "sessions" USING btree ("user_id");--> statement-breakpoint
CREATE UNIQUE INDEX "users_email_key" ON "users" USING btree ("email");