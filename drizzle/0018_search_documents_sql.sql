-- Custom migration (drizzle-kit generate --custom): the search documents (db/search-schema.ts) and
-- the triggers that keep each one current in the transaction of the write that changes it.
--
-- The words a person reads for stored codes (lib/defects.ts, lib/labels.ts); tests/api/search-labels.test.ts
-- checks these against the app's lists.
INSERT INTO search_labels (kind, code, words) VALUES
  ('defect', 'misrun', 'Misrun'),
  ('defect', 'cold-shut', 'Cold shut'),
  ('defect', 'gas-porosity', 'Gas porosity'),
  ('defect', 'blowhole', 'Blowhole'),
  ('defect', 'shrinkage', 'Shrinkage'),
  ('defect', 'rounded-edges', 'Rounded edges'),
  ('defect', 'dross-inclusion', 'Dross or oxide / dross inclusion'),
  ('defect', 'sand-inclusion', 'Sand or coating caught in / sand inclusion'),
  ('defect', 'hot-tear', 'Hot tear'),
  ('defect', 'crack', 'Crack'),
  ('defect', 'fold', 'Fold or lap'),
  ('defect', 'carbon-residue', 'Foam residue / carbon residue'),
  ('defect', 'metal-penetration', 'Metal in the sand / metal penetration'),
  ('defect', 'rough-surface', 'Rough surface'),
  ('defect', 'sand-collapse', 'Sand caved in / sand collapse'),
  ('defect', 'swell', 'Swell'),
  ('defect', 'warp', 'Warp'),
  ('defect', 'flash', 'Flash or fin'),
  ('defect', 'blister', 'Blister'),
  ('defect', 'pinholes', 'Pinholes'),
  ('defect', 'sink', 'Sink'),
  ('defect', 'scab', 'Scab'),
  ('defect', 'rat-tail', 'Rat tail'),
  ('defect', 'buckle', 'Buckle'),
  ('defect', 'erosion', 'Erosion cut or wash'),
  ('defect', 'mismatch', 'Mismatch (shift)'),
  ('defect', 'core-shift', 'Core shift'),
  ('defect', 'run-out', 'Run-out'),
  ('defect', 'leaker', 'Leaker'),
  ('defect', 'segregation', 'Segregation or sweat'),
  ('defect', 'zinc-loss', 'Zinc loss'),
  ('location', 'top', 'top'),
  ('location', 'bottom', 'bottom'),
  ('location', 'side', 'side'),
  ('location', 'corner', 'corner'),
  ('location', 'edge', 'edge'),
  ('location', 'thin-section', 'thin section'),
  ('location', 'thick-section', 'thick section'),
  ('location', 'near-gate', 'near the gate'),
  ('location', 'far-from-gate', 'far from the gate'),
  ('location', 'junction', 'at a junction'),
  ('location', 'parting-line', 'at the parting line'),
  ('location', 'around-core', 'around a core'),
  ('location', 'glue-line', 'along a glue line'),
  ('location', 'surface', 'on the surface'),
  ('location', 'throughout', 'throughout'),
  ('process', 'green-sand', 'green sand'),
  ('process', 'no-bake-sand', 'no-bake sand'),
  ('process', 'lost-foam', 'lost foam'),
  ('process', 'investment', 'investment'),
  ('process', 'plaster', 'plaster'),
  ('process', 'permanent-mould', 'permanent mould'),
  ('degassing', 'none', ''),
  ('degassing', 'argon-lance', 'argon lance degassing'),
  ('degassing', 'nitrogen-lance', 'nitrogen lance degassing'),
  ('degassing', 'rotary', 'rotary degassing'),
  ('degassing', 'tablet', 'tablet degassing');
--> statement-breakpoint
-- Rebuilds the documents of the castings `ids` (a casting that no longer exists is skipped: its
-- document went with it, ON DELETE CASCADE). Set-based, so a bulk insert of 4,000 castings is one
-- call. The castings are locked first (FOR NO KEY UPDATE, which foreign-key checks do not wait on)
-- so two transactions writing to one casting rebuild its document one after the other, and the
-- second, reading with a fresh snapshot, sees the first's rows.
CREATE FUNCTION search_refresh(ids integer[]) RETURNS void LANGUAGE plpgsql AS $$
BEGIN
  PERFORM 1 FROM castings WHERE id = ANY(ids) ORDER BY id FOR NO KEY UPDATE;
  -- An archived casting, or one of an archived melt, has no document: hidden from search and from
  -- "cases like this one" until it is restored, when the same refresh builds it again.
  DELETE FROM search_documents sd USING castings c JOIN melts m ON m.id = c.melt_id
    WHERE sd.casting_id = c.id AND c.id = ANY(ids) AND (c.archived_at IS NOT NULL OR m.archived_at IS NOT NULL);
  INSERT INTO search_documents AS d (
    casting_id, shop_id, melt_id, part_name, pattern, poured_on, alloy, alloy_key, alloy_family, process,
    degassing, outcome, defect_types, marks, mark_places, cause_id, cause_title, cause_confirmed, fix_worked,
    superheat_c, min_section_mm, created_by, causes_text, notes_text, comments_text, document, refreshed_at)
  SELECT x.*, now() FROM (
    SELECT c.id, c.shop_id, c.melt_id, c.part_name, c.pattern, m.poured_on, a.designation,
      upper(regexp_replace(a.designation, '\s+', '', 'g')), a.family, m.process, m.degassing, c.outcome,
      coalesce(mk.types, '{}'), coalesce(mk.marks, '[]'), coalesce(mk.places, '{}'),
      coalesce(cf.cause_id, dg.top_id),
      CASE WHEN cf.casting_id IS NOT NULL
        THEN coalesce(sc.title, dg.titles ->> cf.cause_id, cf.cause_text, replace(cf.cause_id, '-', ' '))
        ELSE coalesce(dg.top_title, dg.top_id) END,
      cf.casting_id IS NOT NULL,
      fx.best,
      m.pour_temp_c - a.liquidus_c, c.min_section_mm, c.created_by,
      txt.causes, txt.notes, coalesce(cm.body, ''),
      setweight(to_tsvector('simple', c.part_name || ' ' || coalesce(c.pattern, '')), 'A')
        || setweight(to_tsvector('simple', coalesce(mk.words, '')), 'A')
        || setweight(to_tsvector('simple', txt.causes), 'B')
        || setweight(to_tsvector('simple', a.designation || ' ' || coalesce(lp.words, '') || ' ' || coalesce(ld.words, '')), 'C')
        || setweight(to_tsvector('simple', txt.notes || ' ' || coalesce(cm.body, '')), 'D')
    FROM castings c
    JOIN melts m ON m.id = c.melt_id
    JOIN alloys a ON a.id = m.alloy_id
    LEFT JOIN search_labels lp ON lp.kind = 'process' AND lp.code = m.process::text
    LEFT JOIN search_labels ld ON ld.kind = 'degassing' AND ld.code = m.degassing::text
    LEFT JOIN LATERAL (
      SELECT array_agg(DISTINCT dm.type) AS types,
        jsonb_agg(jsonb_build_object('type', dm.type, 'location', dm.location, 'severity', dm.severity) ORDER BY dm.id) AS marks,
        array_agg(dm.type::text || '@' || dm.location::text ORDER BY dm.id) AS places,
        string_agg(dm.note, E'\n' ORDER BY dm.id) AS notes,
        string_agg(coalesce(lt.words, dm.type::text) || ' ' || coalesce(ll.words, dm.location::text), ' ') AS words
      FROM defect_marks dm
      LEFT JOIN search_labels lt ON lt.kind = 'defect' AND lt.code = dm.type::text
      LEFT JOIN search_labels ll ON ll.kind = 'location' AND ll.code = dm.location::text
      WHERE dm.casting_id = c.id) mk ON true
    LEFT JOIN LATERAL (
      SELECT string_agg(body, E'\n' ORDER BY created_at, id) AS body FROM comments WHERE casting_id = c.id) cm ON true
    -- The latest diagnosis: its first cause, second cause, the first one's fixes, and every title by id.
    LEFT JOIN LATERAL (
      SELECT s.result -> 'causes' -> 0 ->> 'id' AS top_id, s.result -> 'causes' -> 0 ->> 'title' AS top_title,
        s.result -> 'causes' -> 1 ->> 'title' AS second_title,
        (SELECT string_agg(f, '; ') FROM jsonb_array_elements_text(
          CASE WHEN jsonb_typeof(s.result -> 'causes' -> 0 -> 'fixes') = 'array' THEN s.result -> 'causes' -> 0 -> 'fixes' ELSE '[]' END) f) AS fixes,
        (SELECT jsonb_object_agg(e ->> 'id', e ->> 'title') FROM jsonb_array_elements(
          CASE WHEN jsonb_typeof(s.result -> 'causes') = 'array' THEN s.result -> 'causes' ELSE '[]' END) e
          WHERE e ->> 'id' IS NOT NULL) AS titles
      FROM diagnosis_snapshots s WHERE s.casting_id = c.id ORDER BY s.created_at DESC, s.id DESC LIMIT 1) dg ON true
    -- The newest confirmation counts (db/mentor-schema.ts).
    LEFT JOIN LATERAL (
      SELECT casting_id, cause_id, cause_text FROM confirmations
      WHERE shop_id = c.shop_id AND casting_id = c.id ORDER BY id DESC LIMIT 1) cf ON true
    LEFT JOIN shop_causes sc ON sc.shop_id = c.shop_id AND sc.cause_id = cf.cause_id
    LEFT JOIN LATERAL (
      SELECT (array_agg(worked ORDER BY CASE worked WHEN 'yes' THEN 3 WHEN 'partly' THEN 2 ELSE 1 END DESC)
                FILTER (WHERE worked IS NOT NULL))[1] AS best,
        string_agg(fix, '; ' ORDER BY id) AS fixes
      FROM fixes_tried WHERE casting_id = c.id) fx ON true
    CROSS JOIN LATERAL (SELECT
      concat_ws('; ',
        CASE WHEN cf.casting_id IS NOT NULL
          THEN coalesce(sc.title, dg.titles ->> cf.cause_id, cf.cause_text, replace(cf.cause_id, '-', ' ')) END,
        dg.top_title, dg.second_title, nullif(dg.fixes, ''), fx.fixes) AS causes,
      concat_ws(E'\n', nullif(trim(c.notes), ''), nullif(trim(m.notes), ''), mk.notes) AS notes) txt
    WHERE c.id = ANY(ids) AND c.archived_at IS NULL AND m.archived_at IS NULL
  ) x
  ON CONFLICT (casting_id) DO UPDATE SET
    shop_id = EXCLUDED.shop_id, melt_id = EXCLUDED.melt_id, part_name = EXCLUDED.part_name,
    pattern = EXCLUDED.pattern, poured_on = EXCLUDED.poured_on, alloy = EXCLUDED.alloy,
    alloy_key = EXCLUDED.alloy_key, alloy_family = EXCLUDED.alloy_family, process = EXCLUDED.process,
    degassing = EXCLUDED.degassing, outcome = EXCLUDED.outcome, defect_types = EXCLUDED.defect_types,
    marks = EXCLUDED.marks, mark_places = EXCLUDED.mark_places, cause_id = EXCLUDED.cause_id,
    cause_title = EXCLUDED.cause_title, cause_confirmed = EXCLUDED.cause_confirmed,
    fix_worked = EXCLUDED.fix_worked, superheat_c = EXCLUDED.superheat_c,
    min_section_mm = EXCLUDED.min_section_mm, created_by = EXCLUDED.created_by,
    causes_text = EXCLUDED.causes_text, notes_text = EXCLUDED.notes_text,
    comments_text = EXCLUDED.comments_text, document = EXCLUDED.document, refreshed_at = EXCLUDED.refreshed_at;
  -- The shop's vocabulary for typo widening: plain words of 3 to 32 letters (numbers and
  -- designations are matched as typed). Words no case uses any more stay: widening to them finds nothing.
  INSERT INTO search_words (shop_id, word)
    SELECT DISTINCT d.shop_id, w FROM search_documents d CROSS JOIN LATERAL unnest(tsvector_to_array(d.document)) w
    WHERE d.casting_id = ANY(ids) AND w ~ '^[[:alpha:]]{3,32}$'
  ON CONFLICT DO NOTHING;
END $$;
--> statement-breakpoint
-- Statement-level triggers with transition tables: one refresh per statement, however many rows it wrote.
CREATE FUNCTION search_touch_castings() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  PERFORM search_refresh(ARRAY(SELECT id FROM new_rows));
  RETURN NULL;
END $$;
--> statement-breakpoint
CREATE FUNCTION search_touch_casting_rows() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF TG_OP = 'DELETE' THEN
    PERFORM search_refresh(ARRAY(SELECT DISTINCT casting_id FROM old_rows));
  ELSE
    PERFORM search_refresh(ARRAY(SELECT DISTINCT casting_id FROM new_rows));
  END IF;
  RETURN NULL;
END $$;
--> statement-breakpoint
CREATE FUNCTION search_touch_melts() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  PERFORM search_refresh(ARRAY(SELECT c.id FROM castings c JOIN new_rows m ON m.id = c.melt_id));
  RETURN NULL;
END $$;
--> statement-breakpoint
-- Built-in alloys are upserted at every server start: only a real change refreshes their castings.
CREATE FUNCTION search_touch_alloys() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  PERFORM search_refresh(ARRAY(
    SELECT c.id FROM new_rows a JOIN old_rows o ON o.id = a.id
    JOIN melts m ON m.alloy_id = a.id JOIN castings c ON c.melt_id = m.id
    WHERE a.liquidus_c IS DISTINCT FROM o.liquidus_c OR a.family IS DISTINCT FROM o.family
      OR a.designation IS DISTINCT FROM o.designation));
  RETURN NULL;
END $$;
--> statement-breakpoint
-- A shop cause renamed in the rulebook renames it in the cases confirmed with it.
CREATE FUNCTION search_touch_shop_causes() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  PERFORM search_refresh(ARRAY(
    SELECT d.casting_id FROM search_documents d JOIN new_rows n ON n.shop_id = d.shop_id AND n.cause_id = d.cause_id));
  RETURN NULL;
END $$;
--> statement-breakpoint
CREATE TRIGGER search_castings_ins AFTER INSERT ON castings REFERENCING NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION search_touch_castings();
--> statement-breakpoint
CREATE TRIGGER search_castings_upd AFTER UPDATE ON castings REFERENCING NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION search_touch_castings();
--> statement-breakpoint
CREATE TRIGGER search_melts_upd AFTER UPDATE ON melts REFERENCING NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION search_touch_melts();
--> statement-breakpoint
CREATE TRIGGER search_alloys_upd AFTER UPDATE ON alloys REFERENCING OLD TABLE AS old_rows NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION search_touch_alloys();
--> statement-breakpoint
CREATE TRIGGER search_shop_causes_ins AFTER INSERT ON shop_causes REFERENCING NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION search_touch_shop_causes();
--> statement-breakpoint
CREATE TRIGGER search_shop_causes_upd AFTER UPDATE ON shop_causes REFERENCING NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION search_touch_shop_causes();
--> statement-breakpoint
CREATE TRIGGER search_defect_marks_ins AFTER INSERT ON defect_marks REFERENCING NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION search_touch_casting_rows();
--> statement-breakpoint
CREATE TRIGGER search_defect_marks_upd AFTER UPDATE ON defect_marks REFERENCING NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION search_touch_casting_rows();
--> statement-breakpoint
CREATE TRIGGER search_defect_marks_del AFTER DELETE ON defect_marks REFERENCING OLD TABLE AS old_rows FOR EACH STATEMENT EXECUTE FUNCTION search_touch_casting_rows();
--> statement-breakpoint
CREATE TRIGGER search_comments_ins AFTER INSERT ON comments REFERENCING NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION search_touch_casting_rows();
--> statement-breakpoint
CREATE TRIGGER search_comments_upd AFTER UPDATE ON comments REFERENCING NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION search_touch_casting_rows();
--> statement-breakpoint
CREATE TRIGGER search_comments_del AFTER DELETE ON comments REFERENCING OLD TABLE AS old_rows FOR EACH STATEMENT EXECUTE FUNCTION search_touch_casting_rows();
--> statement-breakpoint
CREATE TRIGGER search_diagnosis_snapshots_ins AFTER INSERT ON diagnosis_snapshots REFERENCING NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION search_touch_casting_rows();
--> statement-breakpoint
CREATE TRIGGER search_diagnosis_snapshots_upd AFTER UPDATE ON diagnosis_snapshots REFERENCING NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION search_touch_casting_rows();
--> statement-breakpoint
CREATE TRIGGER search_diagnosis_snapshots_del AFTER DELETE ON diagnosis_snapshots REFERENCING OLD TABLE AS old_rows FOR EACH STATEMENT EXECUTE FUNCTION search_touch_casting_rows();
--> statement-breakpoint
CREATE TRIGGER search_confirmations_ins AFTER INSERT ON confirmations REFERENCING NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION search_touch_casting_rows();
--> statement-breakpoint
CREATE TRIGGER search_confirmations_upd AFTER UPDATE ON confirmations REFERENCING NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION search_touch_casting_rows();
--> statement-breakpoint
CREATE TRIGGER search_confirmations_del AFTER DELETE ON confirmations REFERENCING OLD TABLE AS old_rows FOR EACH STATEMENT EXECUTE FUNCTION search_touch_casting_rows();
--> statement-breakpoint
CREATE TRIGGER search_fixes_tried_ins AFTER INSERT ON fixes_tried REFERENCING NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION search_touch_casting_rows();
--> statement-breakpoint
CREATE TRIGGER search_fixes_tried_upd AFTER UPDATE ON fixes_tried REFERENCING NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION search_touch_casting_rows();
--> statement-breakpoint
CREATE TRIGGER search_fixes_tried_del AFTER DELETE ON fixes_tried REFERENCING OLD TABLE AS old_rows FOR EACH STATEMENT EXECUTE FUNCTION search_touch_casting_rows();
--> statement-breakpoint
-- Documents for the castings logged before this migration.
SELECT search_refresh(ARRAY(SELECT id FROM castings));
