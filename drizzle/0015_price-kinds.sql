CREATE TABLE "price_kinds" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"shop_id" text NOT NULL,
	"name" text NOT NULL,
	"amount_minor" integer NOT NULL,
	"rush_applies" boolean DEFAULT true NOT NULL,
	"retired_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "price_lines" ADD COLUMN "kind_id" uuid;--> statement-breakpoint
ALTER TABLE "price_lines" ADD COLUMN "rush_applies" boolean;--> statement-breakpoint
ALTER TABLE "price_kinds" ADD CONSTRAINT "price_kinds_shop_id_organization_id_fk" FOREIGN KEY ("shop_id") REFERENCES "public"."organization"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "price_kinds_shop_idx" ON "price_kinds" USING btree ("shop_id","created_at");--> statement-breakpoint
CREATE UNIQUE INDEX "price_kinds_shop_id_uidx" ON "price_kinds" USING btree ("shop_id","id");--> statement-breakpoint
CREATE UNIQUE INDEX "price_kinds_live_name_uidx" ON "price_kinds" USING btree ("shop_id",lower("name")) WHERE retired_at is null;--> statement-breakpoint
ALTER TABLE "price_lines" ADD CONSTRAINT "price_lines_shop_kind_fk" FOREIGN KEY ("shop_id","kind_id") REFERENCES "public"."price_kinds"("shop_id","id") ON DELETE no action ON UPDATE no action;