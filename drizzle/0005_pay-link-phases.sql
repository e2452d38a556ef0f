ALTER TABLE "payment_links" ALTER COLUMN "session_id" DROP NOT NULL;--> statement-breakpoint
ALTER TABLE "payment_links" ALTER COLUMN "url" DROP NOT NULL;--> statement-breakpoint
ALTER TABLE "payment_links" ADD COLUMN "request" jsonb;