-- Custom migration (drizzle-kit generate --custom): one calibration rebuild per shop at a time
-- (server/rulebook/calibration.ts), so two servers working out the same shop cannot deadlock.
--
-- Every transaction that changes a shop's tallies first takes a transaction-level advisory lock keyed
-- by the shop: the rebuild takes it before it locks any row, and the tally trigger takes it too (a
-- casting deleted with its confirmed row, say). So tally rows are only ever locked under that lock.
-- The rebuild locks the rows it works on in casting order and skips rows another transaction holds,
-- so it never waits on a row while holding the lock; a write that only marks a row changed (a
-- confirmation, an edit) touches no tally and never waits for the lock.
CREATE FUNCTION calibration_lock_key(shop text) RETURNS bigint LANGUAGE sql IMMUTABLE AS $$
  SELECT hashtextextended('calibration ' || shop, 0);
$$;
--> statement-breakpoint
-- What one row adds to its rule set's tallies (rules/calibration.ts caseCounts), in one fixed order.
CREATE FUNCTION calibration_items(r calibration_cases) RETURNS TABLE (kind text, item text) LANGUAGE sql STABLE AS $$
  SELECT x.kind, x.item
  FROM (SELECT 'case' AS kind, '' AS item
        UNION ALL SELECT 'fired', unnest(r.fired)
        UNION ALL SELECT 'agreed', unnest(coalesce(r.agreed, '{}'))
        UNION ALL SELECT 'suggested', unnest(coalesce(r.suggested, '{}'))
        UNION ALL SELECT 'right', r.cause_id WHERE r.cause_id = ANY(r.suggested)) x
  WHERE r.cause_id IS NOT NULL AND r.fired IS NOT NULL
  ORDER BY 1, 2;
$$;
--> statement-breakpoint
-- Only the tallies the row names are looked at when one falls to zero (not every tally of the rule set).
CREATE OR REPLACE FUNCTION calibration_tally_add(r calibration_cases, delta integer) RETURNS void LANGUAGE sql AS $$
  SELECT pg_advisory_xact_lock(calibration_lock_key(r.shop_id));
  INSERT INTO calibration_tallies AS t (shop_id, rule_set_version, kind, item, cases)
    SELECT r.shop_id, r.rule_set_version, x.kind, x.item, delta FROM calibration_items(r) x
  ON CONFLICT (shop_id, rule_set_version, kind, item) DO UPDATE SET cases = t.cases + EXCLUDED.cases;
  DELETE FROM calibration_tallies t USING calibration_items(r) x
    WHERE delta < 0 AND t.shop_id = r.shop_id AND t.rule_set_version = r.rule_set_version
      AND t.kind = x.kind AND t.item = x.item AND t.cases <= 0;
$$;
--> statement-breakpoint
-- A rebuild's batch (server/rulebook/calibration.ts) moves its rows' counts set-based: minus what the rows
-- counted before its UPDATE, plus what they count after, in one ordered statement each, with the row
-- trigger off for that transaction (casebook.calibration_batch); row by row it cost about 1 ms a row.
CREATE FUNCTION calibration_tally_rows(shop text, ids integer[], delta integer) RETURNS void LANGUAGE sql AS $$
  SELECT pg_advisory_xact_lock(calibration_lock_key(shop));
  INSERT INTO calibration_tallies AS t (shop_id, rule_set_version, kind, item, cases)
    SELECT k.shop_id, k.rule_set_version, x.kind, x.item, delta * count(*)
    FROM calibration_cases k CROSS JOIN LATERAL calibration_items(k) x
    WHERE k.shop_id = shop AND k.casting_id = ANY(ids)
    GROUP BY 1, 2, 3, 4 ORDER BY 2, 3, 4
  ON CONFLICT (shop_id, rule_set_version, kind, item) DO UPDATE SET cases = t.cases + EXCLUDED.cases;
  DELETE FROM calibration_tallies WHERE delta < 0 AND shop_id = shop AND cases <= 0;
$$;
--> statement-breakpoint
DROP TRIGGER calibration_tally ON calibration_cases;
--> statement-breakpoint
-- Only changes to what a row counts reach the tallies: raising `changes` (a write marking the row) does not.
CREATE TRIGGER calibration_tally_ins AFTER INSERT ON calibration_cases FOR EACH ROW
  WHEN (NEW.cause_id IS NOT NULL AND NEW.fired IS NOT NULL
    AND current_setting('casebook.calibration_batch', true) IS DISTINCT FROM 'on')
  EXECUTE FUNCTION calibration_tally();
--> statement-breakpoint
CREATE TRIGGER calibration_tally_upd AFTER UPDATE ON calibration_cases FOR EACH ROW
  WHEN ((OLD.cause_id, OLD.fired, OLD.agreed, OLD.suggested, OLD.rule_set_version)
    IS DISTINCT FROM (NEW.cause_id, NEW.fired, NEW.agreed, NEW.suggested, NEW.rule_set_version)
    AND current_setting('casebook.calibration_batch', true) IS DISTINCT FROM 'on')
  EXECUTE FUNCTION calibration_tally();
--> statement-breakpoint
CREATE TRIGGER calibration_tally_del AFTER DELETE ON calibration_cases FOR EACH ROW
  WHEN (OLD.cause_id IS NOT NULL AND OLD.fired IS NOT NULL
    AND current_setting('casebook.calibration_batch', true) IS DISTINCT FROM 'on')
  EXECUTE FUNCTION calibration_tally();
