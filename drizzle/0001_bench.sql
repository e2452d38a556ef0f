CREATE TABLE "shop_settings" (
	"shop_id" text PRIMARY KEY NOT NULL,
	"scale" text DEFAULT 'in8' NOT NULL,
	"step_labels" jsonb DEFAULT '{}'::jsonb NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "tickets" ALTER COLUMN "status" SET DEFAULT 'received';--> statement-breakpoint
ALTER TABLE "garments" ADD COLUMN "status" text DEFAULT 'received' NOT NULL;--> statement-breakpoint
ALTER TABLE "garments" ADD COLUMN "assignee_id" text;--> statement-breakpoint
ALTER TABLE "garments" ADD COLUMN "due_on" date;--> statement-breakpoint
ALTER TABLE "garments" ADD COLUMN "created_at" timestamp with time zone DEFAULT now() NOT NULL;--> statement-breakpoint
ALTER TABLE "garments" ADD COLUMN "updated_at" timestamp with time zone DEFAULT now() NOT NULL;--> statement-breakpoint
ALTER TABLE "measurements" ADD COLUMN "leg" text DEFAULT 'left' NOT NULL;--> statement-breakpoint
ALTER TABLE "measurements" ADD COLUMN "finish" text DEFAULT 'cuff' NOT NULL;--> statement-breakpoint
ALTER TABLE "measurements" ADD COLUMN "preset" text;--> statement-breakpoint
ALTER TABLE "tickets" ADD COLUMN "number" integer;--> statement-breakpoint
-- Hand-added: number the tickets already kept, per shop in the order they were opened, from T-1001.
UPDATE "tickets" SET "number" = 1000 + n.rn FROM (SELECT "id", row_number() OVER (PARTITION BY "shop_id" ORDER BY "created_at", "id") AS rn FROM "tickets") AS n WHERE "tickets"."id" = n."id";--> statement-breakpoint
ALTER TABLE "tickets" ALTER COLUMN "number" SET NOT NULL;--> statement-breakpoint
-- Hand-added: the ticket steps become the garment steps; a ticket without garments gets one at its step.
UPDATE "tickets" SET "status" = CASE "status" WHEN 'intake' THEN 'received' WHEN 'queued' THEN 'received' WHEN 'cutting' THEN 'marked' WHEN 'sewing' THEN 'stitched' WHEN 'pressing' THEN 'pressed' ELSE "status" END;--> statement-breakpoint
INSERT INTO "garments" ("shop_id", "ticket_id", "description", "status", "assignee_id", "due_on") SELECT t."shop_id", t."id", coalesce(t."note", 'Trousers'), t."status", t."assignee_id", t."due_on" FROM "tickets" t WHERE NOT EXISTS (SELECT 1 FROM "garments" g WHERE g."ticket_id" = t."id");--> statement-breakpoint
ALTER TABLE "shop_settings" ADD CONSTRAINT "shop_settings_shop_id_organization_id_fk" FOREIGN KEY ("shop_id") REFERENCES "public"."organization"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "garments" ADD CONSTRAINT "garments_assignee_id_user_id_fk" FOREIGN KEY ("assignee_id") REFERENCES "public"."user"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "audit_events_subject_idx" ON "audit_events" USING btree ("shop_id","subject");--> statement-breakpoint
CREATE INDEX "garments_shop_status_idx" ON "garments" USING btree ("shop_id","status");--> statement-breakpoint
CREATE INDEX "garments_ticket_idx" ON "garments" USING btree ("ticket_id");--> statement-breakpoint
CREATE UNIQUE INDEX "measurements_garment_leg_uidx" ON "measurements" USING btree ("garment_id","leg");--> statement-breakpoint
CREATE UNIQUE INDEX "tickets_shop_number_uidx" ON "tickets" USING btree ("shop_id","number");