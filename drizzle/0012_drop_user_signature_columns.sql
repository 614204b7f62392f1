ALTER TABLE "users" DROP COLUMN "signature_data_url";--> statement-breakpoint
ALTER TABLE "users" DROP COLUMN "signature_typed";