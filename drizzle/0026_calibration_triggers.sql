-- Custom migration (drizzle-kit generate --custom): the calibration kept case by case
-- (db/calibration-schema.ts, server/rulebook/calibration.ts).
--
-- The tallies follow calibration_cases row by row, in the transaction that changes the row: a row
-- counts once its cause is a rulebook cause and its fired rules are known (rules/calibration.ts
-- caseCounts says what it adds).
CREATE FUNCTION calibration_tally_add(r calibration_cases, delta integer) RETURNS void LANGUAGE sql AS $$
  INSERT INTO calibration_tallies AS t (shop_id, rule_set_version, kind, item, cases)
    SELECT r.shop_id, r.rule_set_version, x.kind, x.item, delta
    FROM (SELECT 'case' AS kind, '' AS item
          UNION ALL SELECT 'fired', unnest(r.fired)
          UNION ALL SELECT 'agreed', unnest(coalesce(r.agreed, '{}'))
          UNION ALL SELECT 'suggested', unnest(coalesce(r.suggested, '{}'))
          UNION ALL SELECT 'right', r.cause_id WHERE r.cause_id = ANY(r.suggested)) x
    WHERE r.cause_id IS NOT NULL AND r.fired IS NOT NULL
    ORDER BY 3, 4
  ON CONFLICT (shop_id, rule_set_version, kind, item) DO UPDATE SET cases = t.cases + EXCLUDED.cases;
  DELETE FROM calibration_tallies
    WHERE delta < 0 AND shop_id = r.shop_id AND rule_set_version = r.rule_set_version AND cases <= 0;
$$;
--> statement-breakpoint
CREATE FUNCTION calibration_tally() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF TG_OP IN ('UPDATE', 'DELETE') THEN PERFORM calibration_tally_add(OLD, -1); END IF;
  IF TG_OP IN ('INSERT', 'UPDATE') THEN PERFORM calibration_tally_add(NEW, 1); END IF;
  RETURN NULL;
END $$;
--> statement-breakpoint
CREATE TRIGGER calibration_tally AFTER INSERT OR UPDATE OR DELETE ON calibration_cases FOR EACH ROW EXECUTE FUNCTION calibration_tally();
--> statement-breakpoint
-- Something a confirmed casting's calibration row says may have changed: raise its `changes`, and
-- add the row of a casting confirmed for the first time. Castings in id order, so two writers
-- touching the same castings take their row locks in one order.
CREATE FUNCTION calibration_touch(ids integer[]) RETURNS void LANGUAGE sql AS $$
  UPDATE calibration_cases SET changes = changes + 1
    WHERE casting_id IN (SELECT casting_id FROM calibration_cases WHERE casting_id = ANY(ids) ORDER BY 1 FOR UPDATE);
  INSERT INTO calibration_cases (casting_id, shop_id)
    SELECT DISTINCT k.casting_id, k.shop_id FROM confirmations k WHERE k.casting_id = ANY(ids) ORDER BY 1
  ON CONFLICT (casting_id) DO NOTHING;
$$;
--> statement-breakpoint
CREATE FUNCTION calibration_touch_castings() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  PERFORM calibration_touch(ARRAY(SELECT id FROM new_rows));
  RETURN NULL;
END $$;
--> statement-breakpoint
CREATE FUNCTION calibration_touch_casting_rows() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF TG_OP = 'DELETE' THEN
    PERFORM calibration_touch(ARRAY(SELECT DISTINCT casting_id FROM old_rows));
  ELSE
    PERFORM calibration_touch(ARRAY(SELECT DISTINCT casting_id FROM new_rows));
  END IF;
  RETURN NULL;
END $$;
--> statement-breakpoint
CREATE FUNCTION calibration_touch_melts() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  PERFORM calibration_touch(ARRAY(SELECT k.casting_id FROM calibration_cases k JOIN castings c ON c.id = k.casting_id
    JOIN new_rows m ON m.id = c.melt_id));
  RETURN NULL;
END $$;
--> statement-breakpoint
-- The built-in alloys are upserted at every server start with the same figures: only a real change counts.
CREATE FUNCTION calibration_touch_alloys() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  PERFORM calibration_touch(ARRAY(
    SELECT k.casting_id FROM new_rows a JOIN old_rows o ON o.id = a.id
    JOIN melts m ON m.alloy_id = a.id JOIN castings c ON c.melt_id = m.id
    JOIN calibration_cases k ON k.casting_id = c.id
    WHERE ROW(a.*) IS DISTINCT FROM ROW(o.*)));
  RETURN NULL;
END $$;
--> statement-breakpoint
CREATE TRIGGER calibration_castings_upd AFTER UPDATE ON castings REFERENCING NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION calibration_touch_castings();
--> statement-breakpoint
CREATE TRIGGER calibration_melts_upd AFTER UPDATE ON melts REFERENCING NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION calibration_touch_melts();
--> statement-breakpoint
CREATE TRIGGER calibration_alloys_upd AFTER UPDATE ON alloys REFERENCING OLD TABLE AS old_rows NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION calibration_touch_alloys();
--> statement-breakpoint
CREATE TRIGGER calibration_marks_ins AFTER INSERT ON defect_marks REFERENCING NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION calibration_touch_casting_rows();
--> statement-breakpoint
CREATE TRIGGER calibration_marks_upd AFTER UPDATE ON defect_marks REFERENCING NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION calibration_touch_casting_rows();
--> statement-breakpoint
CREATE TRIGGER calibration_marks_del AFTER DELETE ON defect_marks REFERENCING OLD TABLE AS old_rows FOR EACH STATEMENT EXECUTE FUNCTION calibration_touch_casting_rows();
--> statement-breakpoint
CREATE TRIGGER calibration_confirmations_ins AFTER INSERT ON confirmations REFERENCING NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION calibration_touch_casting_rows();
--> statement-breakpoint
CREATE TRIGGER calibration_confirmations_upd AFTER UPDATE ON confirmations REFERENCING NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION calibration_touch_casting_rows();
--> statement-breakpoint
CREATE TRIGGER calibration_confirmations_del AFTER DELETE ON confirmations REFERENCING OLD TABLE AS old_rows FOR EACH STATEMENT EXECUTE FUNCTION calibration_touch_casting_rows();
--> statement-breakpoint
-- Rows for the castings confirmed before this migration (and after a bulk load with triggers off):
-- each is worked out at the shop's next diagnosis.
CREATE FUNCTION calibration_rows_for(shop text) RETURNS void LANGUAGE sql AS $$
  INSERT INTO calibration_cases (casting_id, shop_id)
    SELECT DISTINCT casting_id, shop_id FROM confirmations WHERE shop IS NULL OR shop_id = shop
  ON CONFLICT (casting_id) DO NOTHING;
$$;
--> statement-breakpoint
SELECT calibration_rows_for(NULL);
