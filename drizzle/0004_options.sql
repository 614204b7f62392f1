CREATE TABLE "catalog_items" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"company_id" uuid NOT NULL,
	"sku" text NOT NULL,
	"name" text NOT NULL,
	"kind" text NOT NULL,
	"unit" text NOT NULL,
	"nfa_sq_in_per_unit" double precision,
	"nfa_sq_in_per_ft" double precision,
	"cfm" double precision,
	"sold_in_length_ft" double precision,
	"material_cost_cents" integer NOT NULL,
	"sell_price_cents" integer NOT NULL,
	"labor_minutes_per_unit" integer DEFAULT 0 NOT NULL,
	"is_active" boolean DEFAULT true NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "catalog_items_cents_check" CHECK ("catalog_items"."material_cost_cents" >= 0 and "catalog_items"."sell_price_cents" >= 0)
);
--> statement-breakpoint
CREATE TABLE "design_options" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"company_id" uuid NOT NULL,
	"project_id" uuid NOT NULL,
	"name" text NOT NULL,
	"notes" text,
	"position" integer DEFAULT 0 NOT NULL,
	"spaces" jsonb DEFAULT '[]'::jsonb NOT NULL,
	"labor_lines" jsonb DEFAULT '[]'::jsonb NOT NULL,
	"discount" jsonb DEFAULT '{"kind":"none"}'::jsonb NOT NULL,
	"is_kept" boolean DEFAULT true NOT NULL,
	"origin" text DEFAULT 'manual' NOT NULL,
	"rationale" jsonb DEFAULT '[]'::jsonb NOT NULL,
	"version" integer DEFAULT 1 NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "design_options_version_check" CHECK ("design_options"."version" >= 1)
);
--> statement-breakpoint
ALTER TABLE "catalog_items" ADD CONSTRAINT "catalog_items_company_id_companies_id_fk" FOREIGN KEY ("company_id") REFERENCES "public"."companies"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "design_options" ADD CONSTRAINT "design_options_company_id_companies_id_fk" FOREIGN KEY ("company_id") REFERENCES "public"."companies"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "design_options" ADD CONSTRAINT "design_options_project_id_projects_id_fk" FOREIGN KEY ("project_id") REFERENCES "public"."projects"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "catalog_items_company_sku_idx" ON "catalog_items" USING btree ("company_id",lower("sku"));--> statement-breakpoint
CREATE INDEX "catalog_items_company_kind_idx" ON "catalog_items" USING btree ("company_id","kind");--> statement-breakpoint
CREATE INDEX "design_options_project_idx" ON "design_options" USING btree ("project_id","position");--> statement-breakpoint
CREATE INDEX "design_options_company_idx" ON "design_options" USING btree ("company_id");