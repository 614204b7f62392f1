CREATE TYPE "public"."project_status" AS ENUM('lead', 'surveyed', 'proposed', 'sold', 'lost', 'completed');--> statement-breakpoint
CREATE TABLE "customers" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"company_id" uuid NOT NULL,
	"name" text NOT NULL,
	"phone" text,
	"email" text,
	"billing_address" text,
	"notes" text,
	"search_text" text GENERATED ALWAYS AS (lower(name || ' ' || coalesce(email, '') || ' ' || coalesce(phone, ''))) STORED NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "projects" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"company_id" uuid NOT NULL,
	"customer_id" uuid NOT NULL,
	"title" text NOT NULL,
	"site_address" text NOT NULL,
	"status" "project_status" DEFAULT 'lead' NOT NULL,
	"estimator_id" text,
	"climate_zone" integer NOT NULL,
	"moisture_regime" text,
	"code_basis" text NOT NULL,
	"ceiling_vapor_retarder" text DEFAULT 'none' NOT NULL,
	"roof_color" text DEFAULT 'medium' NOT NULL,
	"notes" text,
	"version" integer DEFAULT 1 NOT NULL,
	"search_text" text GENERATED ALWAYS AS (lower(title || ' ' || site_address)) STORED NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "projects_climate_zone_check" CHECK ("projects"."climate_zone" between 1 and 8),
	CONSTRAINT "projects_version_check" CHECK ("projects"."version" >= 1)
);
--> statement-breakpoint
CREATE TABLE "attic_spaces" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"company_id" uuid NOT NULL,
	"project_id" uuid NOT NULL,
	"name" text NOT NULL,
	"position" integer DEFAULT 0 NOT NULL,
	"roof" jsonb NOT NULL,
	"sections" jsonb DEFAULT '[]'::jsonb NOT NULL,
	"vents" jsonb DEFAULT '[]'::jsonb NOT NULL,
	"site" jsonb DEFAULT '{}'::jsonb NOT NULL,
	"notes" text,
	"version" integer DEFAULT 1 NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "photos" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"company_id" uuid NOT NULL,
	"project_id" uuid NOT NULL,
	"space_id" uuid,
	"vent_id" text,
	"finding_code" text,
	"caption" text,
	"storage_key" text NOT NULL,
	"thumb_key" text NOT NULL,
	"content_type" text NOT NULL,
	"size_bytes" integer NOT NULL,
	"width" integer NOT NULL,
	"height" integer NOT NULL,
	"uploaded_by" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "customers" ADD CONSTRAINT "customers_company_id_companies_id_fk" FOREIGN KEY ("company_id") REFERENCES "public"."companies"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "projects" ADD CONSTRAINT "projects_company_id_companies_id_fk" FOREIGN KEY ("company_id") REFERENCES "public"."companies"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "projects" ADD CONSTRAINT "projects_customer_id_customers_id_fk" FOREIGN KEY ("customer_id") REFERENCES "public"."customers"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "projects" ADD CONSTRAINT "projects_estimator_id_users_id_fk" FOREIGN KEY ("estimator_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "attic_spaces" ADD CONSTRAINT "attic_spaces_company_id_companies_id_fk" FOREIGN KEY ("company_id") REFERENCES "public"."companies"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "attic_spaces" ADD CONSTRAINT "attic_spaces_project_id_projects_id_fk" FOREIGN KEY ("project_id") REFERENCES "public"."projects"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "photos" ADD CONSTRAINT "photos_company_id_companies_id_fk" FOREIGN KEY ("company_id") REFERENCES "public"."companies"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "photos" ADD CONSTRAINT "photos_project_id_projects_id_fk" FOREIGN KEY ("project_id") REFERENCES "public"."projects"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "photos" ADD CONSTRAINT "photos_space_id_attic_spaces_id_fk" FOREIGN KEY ("space_id") REFERENCES "public"."attic_spaces"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "photos" ADD CONSTRAINT "photos_uploaded_by_users_id_fk" FOREIGN KEY ("uploaded_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "customers_company_name_idx" ON "customers" USING btree ("company_id",lower("name"));--> statement-breakpoint
CREATE INDEX "customers_company_updated_idx" ON "customers" USING btree ("company_id","updated_at");--> statement-breakpoint
CREATE INDEX "customers_search_trgm_idx" ON "customers" USING gin ("search_text" gin_trgm_ops);--> statement-breakpoint
CREATE INDEX "projects_company_updated_idx" ON "projects" USING btree ("company_id","updated_at");--> statement-breakpoint
CREATE INDEX "projects_company_created_idx" ON "projects" USING btree ("company_id","created_at");--> statement-breakpoint
CREATE INDEX "projects_company_status_updated_idx" ON "projects" USING btree ("company_id","status","updated_at");--> statement-breakpoint
CREATE INDEX "projects_company_estimator_idx" ON "projects" USING btree ("company_id","estimator_id");--> statement-breakpoint
CREATE INDEX "projects_customer_idx" ON "projects" USING btree ("customer_id");--> statement-breakpoint
CREATE INDEX "projects_search_trgm_idx" ON "projects" USING gin ("search_text" gin_trgm_ops);--> statement-breakpoint
CREATE INDEX "attic_spaces_project_idx" ON "attic_spaces" USING btree ("project_id","position");--> statement-breakpoint
CREATE INDEX "photos_project_idx" ON "photos" USING btree ("project_id","created_at");