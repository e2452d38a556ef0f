DROP INDEX "notices_ticket_kind_uidx";--> statement-breakpoint
ALTER TABLE "notices" ADD COLUMN "sequence" integer DEFAULT 1 NOT NULL;--> statement-breakpoint
CREATE UNIQUE INDEX "notices_ticket_kind_seq_uidx" ON "notices" USING btree ("ticket_id","kind","sequence");