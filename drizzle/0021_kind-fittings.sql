CREATE TABLE "kind_fittings" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"shop_id" text NOT NULL,
	"garment_id" uuid NOT NULL,
	"kind" text NOT NULL,
	"unit" text DEFAULT 'in' NOT NULL,
	"values" jsonb DEFAULT '{}'::jsonb NOT NULL,
	"choices" jsonb DEFAULT '{}'::jsonb NOT NULL,
	"taken_by_id" text,
	"taken_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "kind_fittings" ADD CONSTRAINT "kind_fittings_shop_id_organization_id_fk" FOREIGN KEY ("shop_id") REFERENCES "public"."organization"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "kind_fittings" ADD CONSTRAINT "kind_fittings_garment_id_garments_id_fk" FOREIGN KEY ("garment_id") REFERENCES "public"."garments"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "kind_fittings" ADD CONSTRAINT "kind_fittings_taken_by_id_user_id_fk" FOREIGN KEY ("taken_by_id") REFERENCES "public"."user"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "kind_fittings_garment_uidx" ON "kind_fittings" USING btree ("garment_id");