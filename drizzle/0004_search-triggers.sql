-- Custom migration (drizzle-kit generate --custom): triggers that log which casting each write to
-- the notebook touched, for the casebook search's in-memory index (server/search/index-cache.ts).
-- Statement-level with transition tables: one INSERT per statement, however many rows it wrote.
CREATE FUNCTION search_log_castings() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF TG_OP = 'DELETE' THEN
    INSERT INTO search_changes (shop_id, casting_id, xid)
      SELECT DISTINCT shop_id, id, pg_current_xact_id()::text::bigint FROM old_rows;
  ELSE
    INSERT INTO search_changes (shop_id, casting_id, xid)
      SELECT DISTINCT shop_id, id, pg_current_xact_id()::text::bigint FROM new_rows;
  END IF;
  RETURN NULL;
END $$;
--> statement-breakpoint
-- Rows that belong to one casting (marks, comments, diagnoses, confirmations, fixes tried).
CREATE FUNCTION search_log_casting_rows() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF TG_OP = 'DELETE' THEN
    INSERT INTO search_changes (shop_id, casting_id, xid)
      SELECT DISTINCT shop_id, casting_id, pg_current_xact_id()::text::bigint FROM old_rows;
  ELSE
    INSERT INTO search_changes (shop_id, casting_id, xid)
      SELECT DISTINCT shop_id, casting_id, pg_current_xact_id()::text::bigint FROM new_rows;
  END IF;
  RETURN NULL;
END $$;
--> statement-breakpoint
-- A melt's conditions are part of each of its castings; a new melt has none yet.
CREATE FUNCTION search_log_melts() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  INSERT INTO search_changes (shop_id, casting_id, xid)
    SELECT c.shop_id, c.id, pg_current_xact_id()::text::bigint FROM castings c JOIN new_rows m ON m.id = c.melt_id;
  RETURN NULL;
END $$;
--> statement-breakpoint
-- An alloy's liquidus (so superheat) and family can be updated in place. The built-ins are
-- upserted at every server start, so only a real change logs the castings poured in that alloy.
CREATE FUNCTION search_log_alloys() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  INSERT INTO search_changes (shop_id, casting_id, xid)
    SELECT c.shop_id, c.id, pg_current_xact_id()::text::bigint
    FROM new_rows a JOIN old_rows o ON o.id = a.id
    JOIN melts m ON m.alloy_id = a.id JOIN castings c ON c.melt_id = m.id
    WHERE a.liquidus_c IS DISTINCT FROM o.liquidus_c OR a.family IS DISTINCT FROM o.family;
  RETURN NULL;
END $$;
--> statement-breakpoint
CREATE TRIGGER search_castings_ins AFTER INSERT ON castings REFERENCING NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION search_log_castings();
--> statement-breakpoint
CREATE TRIGGER search_castings_upd AFTER UPDATE ON castings REFERENCING NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION search_log_castings();
--> statement-breakpoint
CREATE TRIGGER search_castings_del AFTER DELETE ON castings REFERENCING OLD TABLE AS old_rows FOR EACH STATEMENT EXECUTE FUNCTION search_log_castings();
--> statement-breakpoint
CREATE TRIGGER search_melts_upd AFTER UPDATE ON melts REFERENCING NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION search_log_melts();
--> statement-breakpoint
CREATE TRIGGER search_alloys_upd AFTER UPDATE ON alloys REFERENCING OLD TABLE AS old_rows NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION search_log_alloys();
--> statement-breakpoint
CREATE TRIGGER search_defect_marks_ins AFTER INSERT ON defect_marks REFERENCING NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION search_log_casting_rows();
--> statement-breakpoint
CREATE TRIGGER search_defect_marks_upd AFTER UPDATE ON defect_marks REFERENCING NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION search_log_casting_rows();
--> statement-breakpoint
CREATE TRIGGER search_defect_marks_del AFTER DELETE ON defect_marks REFERENCING OLD TABLE AS old_rows FOR EACH STATEMENT EXECUTE FUNCTION search_log_casting_rows();
--> statement-breakpoint
CREATE TRIGGER search_comments_ins AFTER INSERT ON comments REFERENCING NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION search_log_casting_rows();
--> statement-breakpoint
CREATE TRIGGER search_comments_upd AFTER UPDATE ON comments REFERENCING NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION search_log_casting_rows();
--> statement-breakpoint
CREATE TRIGGER search_comments_del AFTER DELETE ON comments REFERENCING OLD TABLE AS old_rows FOR EACH STATEMENT EXECUTE FUNCTION search_log_casting_rows();
--> statement-breakpoint
CREATE TRIGGER search_diagnosis_snapshots_ins AFTER INSERT ON diagnosis_snapshots REFERENCING NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION search_log_casting_rows();
--> statement-breakpoint
CREATE TRIGGER search_diagnosis_snapshots_upd AFTER UPDATE ON diagnosis_snapshots REFERENCING NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION search_log_casting_rows();
--> statement-breakpoint
CREATE TRIGGER search_diagnosis_snapshots_del AFTER DELETE ON diagnosis_snapshots REFERENCING OLD TABLE AS old_rows FOR EACH STATEMENT EXECUTE FUNCTION search_log_casting_rows();
--> statement-breakpoint
CREATE TRIGGER search_confirmations_ins AFTER INSERT ON confirmations REFERENCING NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION search_log_casting_rows();
--> statement-breakpoint
CREATE TRIGGER search_confirmations_upd AFTER UPDATE ON confirmations REFERENCING NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION search_log_casting_rows();
--> statement-breakpoint
CREATE TRIGGER search_confirmations_del AFTER DELETE ON confirmations REFERENCING OLD TABLE AS old_rows FOR EACH STATEMENT EXECUTE FUNCTION search_log_casting_rows();
--> statement-breakpoint
CREATE TRIGGER search_fixes_tried_ins AFTER INSERT ON fixes_tried REFERENCING NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION search_log_casting_rows();
--> statement-breakpoint
CREATE TRIGGER search_fixes_tried_upd AFTER UPDATE ON fixes_tried REFERENCING NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION search_log_casting_rows();
--> statement-breakpoint
CREATE TRIGGER search_fixes_tried_del AFTER DELETE ON fixes_tried REFERENCING OLD TABLE AS old_rows FOR EACH STATEMENT EXECUTE FUNCTION search_log_casting_rows();
