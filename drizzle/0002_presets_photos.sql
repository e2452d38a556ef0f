ALTER TABLE "presets" ALTER COLUMN "settings" DROP DEFAULT;--> statement-breakpoint
ALTER TABLE "files" ADD COLUMN "garment_id" uuid;--> statement-breakpoint
ALTER TABLE "files" ADD COLUMN "original_name" text;--> statement-breakpoint
ALTER TABLE "files" ADD COLUMN "thumb_path" text;--> statement-breakpoint
ALTER TABLE "presets" ADD COLUMN "is_default" boolean DEFAULT false NOT NULL;--> statement-breakpoint
ALTER TABLE "presets" ADD COLUMN "updated_at" timestamp with time zone DEFAULT now() NOT NULL;--> statement-breakpoint
ALTER TABLE "files" ADD CONSTRAINT "files_garment_id_garments_id_fk" FOREIGN KEY ("garment_id") REFERENCES "public"."garments"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "files_garment_idx" ON "files" USING btree ("garment_id");--> statement-breakpoint
CREATE UNIQUE INDEX "presets_one_house_default_uidx" ON "presets" USING btree ("shop_id") WHERE "presets"."is_default" and "presets"."owner_id" is null;