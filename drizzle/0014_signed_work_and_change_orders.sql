CREATE TABLE "change_orders" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"company_id" uuid NOT NULL,
	"project_id" uuid NOT NULL,
	"proposal_id" uuid NOT NULL,
	"number" integer NOT NULL,
	"status" text DEFAULT 'draft' NOT NULL,
	"reason" text NOT NULL,
	"lines" jsonb DEFAULT '[]'::jsonb NOT NULL,
	"photo_ids" jsonb DEFAULT '[]'::jsonb NOT NULL,
	"snapshot" jsonb,
	"snapshot_sha256" text,
	"pdf_key" text,
	"pdf_sha256" text,
	"acceptance" jsonb,
	"decline_reason" text,
	"token_hash" text,
	"token_id" uuid,
	"created_by" text,
	"sent_by" text,
	"sent_at" timestamp with time zone,
	"decided_at" timestamp with time zone,
	"version" integer DEFAULT 1 NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "change_orders_status_check" CHECK ("change_orders"."status" in ('draft', 'sent', 'signed', 'declined')),
	CONSTRAINT "change_orders_version_check" CHECK ("change_orders"."version" >= 1)
);
--> statement-breakpoint
ALTER TABLE "proposals" ADD COLUMN "crew_plans" jsonb;--> statement-breakpoint
ALTER TABLE "change_orders" ADD CONSTRAINT "change_orders_company_id_companies_id_fk" FOREIGN KEY ("company_id") REFERENCES "public"."companies"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "change_orders" ADD CONSTRAINT "change_orders_project_id_projects_id_fk" FOREIGN KEY ("project_id") REFERENCES "public"."projects"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "change_orders" ADD CONSTRAINT "change_orders_proposal_id_proposals_id_fk" FOREIGN KEY ("proposal_id") REFERENCES "public"."proposals"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "change_orders" ADD CONSTRAINT "change_orders_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "change_orders" ADD CONSTRAINT "change_orders_sent_by_users_id_fk" FOREIGN KEY ("sent_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "change_orders_number_idx" ON "change_orders" USING btree ("proposal_id","number");--> statement-breakpoint
CREATE INDEX "change_orders_project_idx" ON "change_orders" USING btree ("project_id","created_at");--> statement-breakpoint
CREATE UNIQUE INDEX "change_orders_pdf_idx" ON "change_orders" USING btree ("pdf_sha256");--> statement-breakpoint
CREATE UNIQUE INDEX "change_orders_token_hash_idx" ON "change_orders" USING btree ("token_hash");