-- Each move of a shop's queue-list version is also told on the channel shop_list_version (payload:
-- the shop's id), at commit like the move itself (NOTIFY is transactional). The embedded database's
-- one process listens and keeps the versions it read until told (src/services/queue.ts); on a
-- PostgreSQL server nobody listens and the notification is dropped.
CREATE OR REPLACE FUNCTION bump_shop_list(shop text) RETURNS void LANGUAGE plpgsql AS $$
BEGIN
  INSERT INTO shop_list_versions (shop_id, version)
  SELECT shop, (extract(epoch from clock_timestamp()) * 1000000)::bigint
  WHERE EXISTS (SELECT 1 FROM organization o WHERE o.id = shop)
  ON CONFLICT (shop_id) DO UPDATE SET version = greatest(shop_list_versions.version + 1, excluded.version);
  PERFORM pg_notify('shop_list_version', shop);
END $$;
