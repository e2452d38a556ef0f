CREATE TABLE "shop_list_versions" (
	"shop_id" text PRIMARY KEY NOT NULL,
	"version" bigint NOT NULL
);
--> statement-breakpoint
ALTER TABLE "shop_list_versions" ADD CONSTRAINT "shop_list_versions_shop_id_organization_id_fk" FOREIGN KEY ("shop_id") REFERENCES "public"."organization"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
-- The queue list's version moves with every write to what the list shows: garments, their tickets
-- and customers, an assignee's name, and garment.moved events (a ready row's time). Constraint
-- triggers deferred to commit: the version row is locked last and briefly, so two writers of a shop
-- wait for each other only while committing, and never hold it while taking another lock.
-- A shop being deleted gets no row (its organization is gone by commit).
CREATE FUNCTION bump_shop_list(shop text) RETURNS void LANGUAGE sql AS $$
  INSERT INTO shop_list_versions (shop_id, version)
  SELECT shop, (extract(epoch from clock_timestamp()) * 1000000)::bigint
  WHERE EXISTS (SELECT 1 FROM organization o WHERE o.id = shop)
  ON CONFLICT (shop_id) DO UPDATE SET version = greatest(shop_list_versions.version + 1, excluded.version);
$$;
--> statement-breakpoint
CREATE FUNCTION shop_list_row_changed() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF TG_OP = 'INSERT' THEN
    PERFORM bump_shop_list(NEW.shop_id);
  ELSIF TG_OP = 'DELETE' THEN
    PERFORM bump_shop_list(OLD.shop_id);
  ELSE
    PERFORM bump_shop_list(NEW.shop_id);
    IF NEW.shop_id IS DISTINCT FROM OLD.shop_id THEN PERFORM bump_shop_list(OLD.shop_id); END IF;
  END IF;
  RETURN NULL;
END $$;
--> statement-breakpoint
CREATE FUNCTION shop_list_assignee_renamed() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  PERFORM bump_shop_list(s.shop_id) FROM (SELECT DISTINCT g.shop_id FROM garments g WHERE g.assignee_id = NEW.id ORDER BY 1) s;
  RETURN NULL;
END $$;
--> statement-breakpoint
CREATE CONSTRAINT TRIGGER garments_list_version AFTER INSERT OR UPDATE OR DELETE ON garments DEFERRABLE INITIALLY DEFERRED FOR EACH ROW EXECUTE FUNCTION shop_list_row_changed();
--> statement-breakpoint
CREATE CONSTRAINT TRIGGER tickets_list_version AFTER INSERT OR UPDATE OR DELETE ON tickets DEFERRABLE INITIALLY DEFERRED FOR EACH ROW EXECUTE FUNCTION shop_list_row_changed();
--> statement-breakpoint
CREATE CONSTRAINT TRIGGER customers_list_version AFTER INSERT OR UPDATE OR DELETE ON customers DEFERRABLE INITIALLY DEFERRED FOR EACH ROW EXECUTE FUNCTION shop_list_row_changed();
--> statement-breakpoint
CREATE CONSTRAINT TRIGGER audit_moved_list_version AFTER INSERT ON audit_events DEFERRABLE INITIALLY DEFERRED FOR EACH ROW WHEN (NEW.action = 'garment.moved') EXECUTE FUNCTION shop_list_row_changed();
--> statement-breakpoint
CREATE CONSTRAINT TRIGGER audit_moved_gone_list_version AFTER DELETE ON audit_events DEFERRABLE INITIALLY DEFERRED FOR EACH ROW WHEN (OLD.action = 'garment.moved') EXECUTE FUNCTION shop_list_row_changed();
--> statement-breakpoint
CREATE CONSTRAINT TRIGGER user_name_list_version AFTER UPDATE OF name ON "user" DEFERRABLE INITIALLY DEFERRED FOR EACH ROW WHEN (OLD.name IS DISTINCT FROM NEW.name) EXECUTE FUNCTION shop_list_assignee_renamed();
