ALTER TABLE "customers" ADD COLUMN "phone_digits" text GENERATED ALWAYS AS (regexp_replace(coalesce("customers"."phone", ''), '[^0-9]', '', 'g')) STORED;--> statement-breakpoint
ALTER TABLE "customers" ADD COLUMN "erased_at" timestamp with time zone;--> statement-breakpoint
CREATE INDEX "customers_shop_name_idx" ON "customers" USING btree ("shop_id",lower("name") text_pattern_ops);--> statement-breakpoint
CREATE INDEX "customers_shop_email_idx" ON "customers" USING btree ("shop_id",lower("email") text_pattern_ops);--> statement-breakpoint
CREATE INDEX "customers_shop_phone_idx" ON "customers" USING btree ("shop_id","phone_digits" text_pattern_ops);