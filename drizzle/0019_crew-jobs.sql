ALTER TYPE "public"."role" ADD VALUE 'crew';--> statement-breakpoint
CREATE TABLE "job_ticks" (
	"job_id" uuid NOT NULL,
	"company_id" uuid NOT NULL,
	"item_id" text NOT NULL,
	"ticked_by" text,
	"ticked_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "jobs" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"company_id" uuid NOT NULL,
	"project_id" uuid NOT NULL,
	"proposal_id" uuid NOT NULL,
	"crew_user_id" text NOT NULL,
	"scheduled_for" date NOT NULL,
	"status" text DEFAULT 'assigned' NOT NULL,
	"assigned_by" text,
	"completed_at" timestamp with time zone,
	"completed_by" text,
	"report_token_hash" text,
	"report_pdf_key" text,
	"report_pdf_sha256" text,
	"version" integer DEFAULT 1 NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "jobs_status_check" CHECK ("jobs"."status" in ('assigned', 'completed'))
);
--> statement-breakpoint
ALTER TABLE "photos" ADD COLUMN "job_item_id" text;--> statement-breakpoint
ALTER TABLE "payments" ADD COLUMN "purpose" text DEFAULT 'deposit' NOT NULL;--> statement-breakpoint
ALTER TABLE "job_ticks" ADD CONSTRAINT "job_ticks_job_id_jobs_id_fk" FOREIGN KEY ("job_id") REFERENCES "public"."jobs"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "job_ticks" ADD CONSTRAINT "job_ticks_company_id_companies_id_fk" FOREIGN KEY ("company_id") REFERENCES "public"."companies"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "job_ticks" ADD CONSTRAINT "job_ticks_ticked_by_users_id_fk" FOREIGN KEY ("ticked_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "jobs" ADD CONSTRAINT "jobs_company_id_companies_id_fk" FOREIGN KEY ("company_id") REFERENCES "public"."companies"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "jobs" ADD CONSTRAINT "jobs_project_id_projects_id_fk" FOREIGN KEY ("project_id") REFERENCES "public"."projects"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "jobs" ADD CONSTRAINT "jobs_proposal_id_proposals_id_fk" FOREIGN KEY ("proposal_id") REFERENCES "public"."proposals"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "jobs" ADD CONSTRAINT "jobs_crew_user_id_users_id_fk" FOREIGN KEY ("crew_user_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "jobs" ADD CONSTRAINT "jobs_assigned_by_users_id_fk" FOREIGN KEY ("assigned_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "jobs" ADD CONSTRAINT "jobs_completed_by_users_id_fk" FOREIGN KEY ("completed_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "job_ticks_job_item_idx" ON "job_ticks" USING btree ("job_id","item_id");--> statement-breakpoint
CREATE UNIQUE INDEX "jobs_project_idx" ON "jobs" USING btree ("project_id");--> statement-breakpoint
CREATE INDEX "jobs_company_crew_idx" ON "jobs" USING btree ("company_id","crew_user_id","scheduled_for");--> statement-breakpoint
CREATE UNIQUE INDEX "jobs_report_token_idx" ON "jobs" USING btree ("report_token_hash");--> statement-breakpoint
ALTER TABLE "payments" ADD CONSTRAINT "payments_purpose_check" CHECK ("payments"."purpose" in ('deposit', 'balance'));