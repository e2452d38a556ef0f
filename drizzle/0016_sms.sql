DROP INDEX "notices_ticket_kind_seq_uidx";--> statement-breakpoint
ALTER TABLE "customers" ADD COLUMN "contact_by" text DEFAULT 'email' NOT NULL;--> statement-breakpoint
ALTER TABLE "notices" ADD COLUMN "channel" text DEFAULT 'email' NOT NULL;--> statement-breakpoint
ALTER TABLE "notices" ADD COLUMN "note" text;--> statement-breakpoint
ALTER TABLE "notices" ADD COLUMN "provider_id" text;--> statement-breakpoint
ALTER TABLE "notices" ADD COLUMN "delivery" text;--> statement-breakpoint
ALTER TABLE "notices" ADD COLUMN "delivery_error" text;--> statement-breakpoint
ALTER TABLE "notices" ADD COLUMN "delivery_at" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "sent_mail" ADD COLUMN "channel" text DEFAULT 'email' NOT NULL;--> statement-breakpoint
ALTER TABLE "sent_mail" ADD COLUMN "body" text;--> statement-breakpoint
CREATE UNIQUE INDEX "notices_ticket_kind_channel_seq_uidx" ON "notices" USING btree ("ticket_id","kind","channel","sequence");--> statement-breakpoint
CREATE INDEX "notices_provider_idx" ON "notices" USING btree ("provider_id");