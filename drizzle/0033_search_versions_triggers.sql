-- Custom migration (drizzle-kit generate --custom): the two versions a server's search keeps its work
-- under. Every word added to or removed from a shop's search_words raises its version in
-- search_vocabularies (the similar words of a query word, server/search/similar-words.ts); every
-- search document written or removed raises its version in search_document_versions (whole answers,
-- server/search/answers.ts). So a server's kept work is known to be stale on every server the moment
-- the write commits.
-- Deferred to commit, like shop_revisions (0013), and once per shop per committing transaction, not
-- per row: a version only has to move when a transaction that changed the shop's words or documents
-- commits (a per-row bump made a bulk rebuild of 100,000 documents 298 s instead of 130 s). A
-- transaction-local setting lists the shops already bumped.
-- Lock order: the first bump of a shop takes its shop_revisions row before its own version row. Both
-- are locked by deferred triggers at commit, in the order the transaction queued its writes: a
-- transaction that wrote a comment (new words) then a confirmation (a new revision) and one that did
-- the reverse would each hold one row and wait for the other. With the revision row always first, the
-- one that takes it first finishes and the other waits. A row at revision 0 reads as no row
-- (db/revision-schema.ts), so making it here changes no revision.
CREATE FUNCTION search_version_first(flag text, shop text) RETURNS boolean LANGUAGE plpgsql AS $$
DECLARE done text := coalesce(current_setting(flag, true), '');
BEGIN
  IF position(',' || shop || ',' IN done) > 0 THEN RETURN false; END IF;
  PERFORM set_config(flag, CASE WHEN done = '' THEN ',' ELSE done END || shop || ',', true);
  INSERT INTO shop_revisions (shop_id, revision) VALUES (shop, 0) ON CONFLICT (shop_id) DO NOTHING;
  PERFORM 1 FROM shop_revisions WHERE shop_id = shop FOR UPDATE;
  RETURN true;
END $$;
--> statement-breakpoint
CREATE FUNCTION search_vocabulary_bump() RETURNS trigger LANGUAGE plpgsql AS $$
DECLARE shop text := CASE WHEN TG_OP = 'DELETE' THEN OLD.shop_id ELSE NEW.shop_id END;
BEGIN
  IF search_version_first('casebook.search_words_bumped', shop) THEN
    INSERT INTO search_vocabularies (shop_id, version) VALUES (shop, 1)
    ON CONFLICT (shop_id) DO UPDATE SET version = search_vocabularies.version + 1;
  END IF;
  RETURN NULL;
END $$;
--> statement-breakpoint
-- A document moved to another shop (never done today) changes that shop's answers too.
CREATE FUNCTION search_documents_bump() RETURNS trigger LANGUAGE plpgsql AS $$
DECLARE shop text;
BEGIN
  FOREACH shop IN ARRAY CASE TG_OP WHEN 'DELETE' THEN ARRAY[OLD.shop_id] WHEN 'INSERT' THEN ARRAY[NEW.shop_id]
    ELSE ARRAY[NEW.shop_id, OLD.shop_id] END LOOP
    IF search_version_first('casebook.search_documents_bumped', shop) THEN
      INSERT INTO search_document_versions (shop_id, version) VALUES (shop, 1)
      ON CONFLICT (shop_id) DO UPDATE SET version = search_document_versions.version + 1;
    END IF;
  END LOOP;
  RETURN NULL;
END $$;
--> statement-breakpoint
CREATE CONSTRAINT TRIGGER search_vocabulary_words AFTER INSERT OR UPDATE OR DELETE ON search_words DEFERRABLE INITIALLY DEFERRED FOR EACH ROW EXECUTE FUNCTION search_vocabulary_bump();
--> statement-breakpoint
CREATE CONSTRAINT TRIGGER search_documents_versions AFTER INSERT OR UPDATE OR DELETE ON search_documents DEFERRABLE INITIALLY DEFERRED FOR EACH ROW EXECUTE FUNCTION search_documents_bump();
--> statement-breakpoint
-- Shops that already have words or documents start at their count (any value would do: it only has to move).
INSERT INTO search_vocabularies (shop_id, version) SELECT shop_id, count(*) FROM search_words GROUP BY shop_id;
--> statement-breakpoint
INSERT INTO search_document_versions (shop_id, version) SELECT shop_id, count(*) FROM search_documents GROUP BY shop_id;
