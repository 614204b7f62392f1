ALTER TABLE "proposal_mails" ADD COLUMN "payload" jsonb;--> statement-breakpoint
ALTER TABLE "proposal_mails" ADD COLUMN "lease_until" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "proposal_mails" ADD COLUMN "delivered_at" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "proposals" ADD COLUMN "signed_render_updated_at" timestamp with time zone;