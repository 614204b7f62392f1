CREATE TABLE "proposal_retired_links" (
	"token_hash" text PRIMARY KEY NOT NULL,
	"company_id" uuid NOT NULL,
	"proposal_id" uuid NOT NULL,
	"token_id" uuid,
	"reason" text NOT NULL,
	"retired_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "proposal_retired_links_reason_check" CHECK ("proposal_retired_links"."reason" in ('revoked', 'replaced'))
);
--> statement-breakpoint
ALTER TABLE "proposal_retired_links" ADD CONSTRAINT "proposal_retired_links_company_id_companies_id_fk" FOREIGN KEY ("company_id") REFERENCES "public"."companies"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "proposal_retired_links" ADD CONSTRAINT "proposal_retired_links_proposal_id_proposals_id_fk" FOREIGN KEY ("proposal_id") REFERENCES "public"."proposals"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "proposal_retired_links_proposal_idx" ON "proposal_retired_links" USING btree ("proposal_id");