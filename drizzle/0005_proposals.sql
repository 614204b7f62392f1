CREATE TYPE "public"."proposal_status" AS ENUM('draft', 'sent', 'viewed', 'accepted', 'declined', 'expired');--> statement-breakpoint
CREATE TYPE "public"."render_status" AS ENUM('none', 'queued', 'rendering', 'ready', 'failed');--> statement-breakpoint
CREATE TABLE "proposal_events" (
	"id" bigserial PRIMARY KEY NOT NULL,
	"company_id" uuid NOT NULL,
	"proposal_id" uuid NOT NULL,
	"event" text NOT NULL,
	"at" timestamp with time zone DEFAULT now() NOT NULL,
	"user_id" text,
	"ip" text,
	"user_agent" text,
	"token_id" uuid,
	"snapshot_sha256" text,
	"pdf_sha256" text,
	"consent_text_version" text,
	"detail" jsonb DEFAULT '{}'::jsonb NOT NULL
);
--> statement-breakpoint
CREATE TABLE "proposal_mails" (
	"dedupe_key" text PRIMARY KEY NOT NULL,
	"company_id" uuid NOT NULL,
	"proposal_id" uuid NOT NULL,
	"kind" text NOT NULL,
	"to_address" text NOT NULL,
	"queued_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "proposals" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"company_id" uuid NOT NULL,
	"project_id" uuid NOT NULL,
	"series_id" uuid NOT NULL,
	"revision" integer DEFAULT 1 NOT NULL,
	"status" "proposal_status" DEFAULT 'draft' NOT NULL,
	"cover_note" text,
	"terms" text,
	"valid_until" date NOT NULL,
	"deposit_rule" jsonb,
	"option_ids" jsonb DEFAULT '[]'::jsonb NOT NULL,
	"photo_ids" jsonb DEFAULT '[]'::jsonb NOT NULL,
	"finding_codes" jsonb,
	"scopes" jsonb DEFAULT '{}'::jsonb NOT NULL,
	"created_by" text,
	"seller_user_id" text,
	"snapshot" jsonb,
	"snapshot_sha256" text,
	"pdf_key" text,
	"pdf_sha256" text,
	"pdf_snapshot_sha256" text,
	"render_status" "render_status" DEFAULT 'none' NOT NULL,
	"render_attempts" integer DEFAULT 0 NOT NULL,
	"render_error" text,
	"render_updated_at" timestamp with time zone,
	"signed_pdf_key" text,
	"signed_pdf_sha256" text,
	"signed_render_status" "render_status" DEFAULT 'none' NOT NULL,
	"signed_render_error" text,
	"acceptance" jsonb,
	"decline_reason" text,
	"token_hash" text,
	"token_id" uuid,
	"token_expires_at" timestamp with time zone,
	"token_revoked_at" timestamp with time zone,
	"superseded_by" uuid,
	"sent_at" timestamp with time zone,
	"viewed_at" timestamp with time zone,
	"decided_at" timestamp with time zone,
	"reminder_sent_at" timestamp with time zone,
	"version" integer DEFAULT 1 NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "proposals_version_check" CHECK ("proposals"."version" >= 1)
);
--> statement-breakpoint
ALTER TABLE "proposals" ADD CONSTRAINT "proposals_company_id_companies_id_fk" FOREIGN KEY ("company_id") REFERENCES "public"."companies"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "proposals" ADD CONSTRAINT "proposals_project_id_projects_id_fk" FOREIGN KEY ("project_id") REFERENCES "public"."projects"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "proposals" ADD CONSTRAINT "proposals_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "proposals" ADD CONSTRAINT "proposals_seller_user_id_users_id_fk" FOREIGN KEY ("seller_user_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "proposal_events_proposal_idx" ON "proposal_events" USING btree ("proposal_id","id");--> statement-breakpoint
CREATE INDEX "proposals_project_idx" ON "proposals" USING btree ("project_id","created_at");--> statement-breakpoint
CREATE INDEX "proposals_company_status_idx" ON "proposals" USING btree ("company_id","status","updated_at");--> statement-breakpoint
CREATE UNIQUE INDEX "proposals_series_revision_idx" ON "proposals" USING btree ("series_id","revision");--> statement-breakpoint
CREATE UNIQUE INDEX "proposals_token_hash_idx" ON "proposals" USING btree ("token_hash");