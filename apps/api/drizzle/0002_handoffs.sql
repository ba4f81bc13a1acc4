CREATE TABLE "handoff_recipients" (
	"handoff_id" uuid NOT NULL,
	"email" text NOT NULL,
	"user_id" uuid,
	CONSTRAINT "handoff_recipients_pkey" PRIMARY KEY("handoff_id","email")
);
--> statement-breakpoint
CREATE TABLE "handoffs" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"project_id" uuid NOT NULL,
	"beam_id" uuid NOT NULL,
	"revision_id" uuid NOT NULL,
	"issued_by" uuid NOT NULL,
	"message" text,
	"message_id" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "beam_revisions" DROP CONSTRAINT "beam_revisions_checked_check";--> statement-breakpoint
ALTER TABLE "handoff_recipients" ADD CONSTRAINT "handoff_recipients_handoff_id_handoffs_id_fk" FOREIGN KEY ("handoff_id") REFERENCES "public"."handoffs"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "handoff_recipients" ADD CONSTRAINT "handoff_recipients_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "handoffs" ADD CONSTRAINT "handoffs_project_id_projects_id_fk" FOREIGN KEY ("project_id") REFERENCES "public"."projects"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "handoffs" ADD CONSTRAINT "handoffs_beam_id_beams_id_fk" FOREIGN KEY ("beam_id") REFERENCES "public"."beams"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "handoffs" ADD CONSTRAINT "handoffs_revision_id_beam_revisions_id_fk" FOREIGN KEY ("revision_id") REFERENCES "public"."beam_revisions"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "handoffs" ADD CONSTRAINT "handoffs_issued_by_users_id_fk" FOREIGN KEY ("issued_by") REFERENCES "public"."users"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "handoff_recipients_user_id_idx" ON "handoff_recipients" USING btree ("user_id");--> statement-breakpoint
CREATE INDEX "handoffs_project_id_idx" ON "handoffs" USING btree ("project_id","created_at");--> statement-breakpoint
CREATE INDEX "handoffs_beam_id_idx" ON "handoffs" USING btree ("beam_id","created_at");--> statement-breakpoint
CREATE INDEX "handoffs_revision_id_idx" ON "handoffs" USING btree ("revision_id");--> statement-breakpoint
CREATE INDEX "handoffs_issued_by_idx" ON "handoffs" USING btree ("issued_by");--> statement-breakpoint
ALTER TABLE "beam_revisions" ADD CONSTRAINT "beam_revisions_checked_check" CHECK (("beam_revisions"."status" <> 'draft' or ("beam_revisions"."checked_by" is null and "beam_revisions"."checked_at" is null)) and ("beam_revisions"."status" <> 'checked' or ("beam_revisions"."checked_by" is not null and "beam_revisions"."checked_at" is not null)));