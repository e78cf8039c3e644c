-- Custom migration (drizzle-kit generate --custom): the keys the castings and melts lists page on
-- (server/castings/list-order.ts, server/melts/list-order.ts) kept in the transaction of each write.
-- castings.poured_on is its melt's day; melt_casting_counts holds each melt's castings in use.
-- Row triggers: a casting's melt and a melt's day change one row at a time.
CREATE FUNCTION list_keys_casting_day() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  -- A melt that does not exist leaves the default, and the foreign key refuses the row.
  NEW.poured_on := coalesce((SELECT m.poured_on FROM melts m WHERE m.id = NEW.melt_id), NEW.poured_on);
  RETURN NEW;
END $$;
--> statement-breakpoint
CREATE TRIGGER list_keys_casting_day BEFORE INSERT OR UPDATE OF melt_id ON castings
  FOR EACH ROW EXECUTE FUNCTION list_keys_casting_day();
--> statement-breakpoint
-- Counted by differences, so an archive of an archived casting (or a restore of one in use) adds nothing.
CREATE FUNCTION list_keys_casting_count() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF TG_OP IN ('UPDATE', 'DELETE') AND OLD.archived_at IS NULL THEN
    UPDATE melt_casting_counts SET castings = castings - 1 WHERE melt_id = OLD.melt_id;
  END IF;
  IF TG_OP IN ('INSERT', 'UPDATE') AND NEW.archived_at IS NULL THEN
    UPDATE melt_casting_counts SET castings = castings + 1 WHERE melt_id = NEW.melt_id;
  END IF;
  RETURN NULL;
END $$;
--> statement-breakpoint
CREATE TRIGGER list_keys_casting_count AFTER INSERT OR DELETE OR UPDATE OF archived_at, melt_id ON castings
  FOR EACH ROW EXECUTE FUNCTION list_keys_casting_count();
--> statement-breakpoint
CREATE FUNCTION list_keys_melt_added() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  INSERT INTO melt_casting_counts (melt_id, shop_id, poured_on, castings) VALUES (NEW.id, NEW.shop_id, NEW.poured_on, 0);
  RETURN NULL;
END $$;
--> statement-breakpoint
CREATE TRIGGER list_keys_melt_added AFTER INSERT ON melts FOR EACH ROW EXECUTE FUNCTION list_keys_melt_added();
--> statement-breakpoint
CREATE FUNCTION list_keys_melt_day() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  UPDATE castings SET poured_on = NEW.poured_on WHERE melt_id = NEW.id;
  UPDATE melt_casting_counts SET poured_on = NEW.poured_on WHERE melt_id = NEW.id;
  RETURN NULL;
END $$;
--> statement-breakpoint
CREATE TRIGGER list_keys_melt_day AFTER UPDATE OF poured_on ON melts
  FOR EACH ROW WHEN (OLD.poured_on IS DISTINCT FROM NEW.poured_on) EXECUTE FUNCTION list_keys_melt_day();
--> statement-breakpoint
-- Every key of one shop worked out again: the backfill below, and rows written with triggers off
-- (the benchmarks' bulk seeding, scripts/bench-search-data.ts).
CREATE FUNCTION list_keys_rebuild(shop text) RETURNS void LANGUAGE sql AS $$
  UPDATE castings c SET poured_on = m.poured_on FROM melts m
    WHERE m.id = c.melt_id AND c.shop_id = shop AND c.poured_on IS DISTINCT FROM m.poured_on;
  INSERT INTO melt_casting_counts (melt_id, shop_id, poured_on, castings)
    SELECT m.id, m.shop_id, m.poured_on,
      (SELECT count(*)::int FROM castings c WHERE c.melt_id = m.id AND c.archived_at IS NULL)
    FROM melts m WHERE m.shop_id = shop
  ON CONFLICT (melt_id) DO UPDATE SET poured_on = EXCLUDED.poured_on, castings = EXCLUDED.castings;
$$;
--> statement-breakpoint
SELECT list_keys_rebuild(id) FROM organization;
