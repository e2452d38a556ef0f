ALTER TABLE "measurements" ADD COLUMN "preset_id" uuid;--> statement-breakpoint
ALTER TABLE "measurements" ADD CONSTRAINT "measurements_preset_id_presets_id_fk" FOREIGN KEY ("preset_id") REFERENCES "public"."presets"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "measurements_preset_idx" ON "measurements" USING btree ("preset_id");--> statement-breakpoint
-- Backfill: a fitting that recorded a preset's name points at that preset of the same shop, the
-- house preset first, else the taker's own; a name no longer found stays as the name alone.
UPDATE "measurements" AS m SET "preset_id" = p."id" FROM "presets" AS p
WHERE m."preset_id" IS NULL AND m."preset" IS NOT NULL AND p."shop_id" = m."shop_id" AND p."owner_id" IS NULL AND p."name" = m."preset";--> statement-breakpoint
UPDATE "measurements" AS m SET "preset_id" = p."id" FROM "presets" AS p
WHERE m."preset_id" IS NULL AND m."preset" IS NOT NULL AND p."shop_id" = m."shop_id" AND p."owner_id" = m."taken_by_id" AND p."name" = m."preset";
