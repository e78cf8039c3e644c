-- Custom migration (drizzle-kit generate --custom): every word added to or removed from a shop's
-- search_words raises its version in search_vocabularies, so a server's cache of a query word's
-- similar words (server/search/similar-words.ts), kept under (shop, version), is known to be stale
-- on every server the moment the write commits. Deferred to commit like shop_revisions (0013): the
-- version row is locked last, so two writers adding words cannot wait on each other through it.
CREATE FUNCTION search_vocabulary_bump() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  INSERT INTO search_vocabularies (shop_id, version)
    VALUES (CASE WHEN TG_OP = 'DELETE' THEN OLD.shop_id ELSE NEW.shop_id END, 1)
  ON CONFLICT (shop_id) DO UPDATE SET version = search_vocabularies.version + 1;
  RETURN NULL;
END $$;
--> statement-breakpoint
CREATE CONSTRAINT TRIGGER search_vocabulary_words AFTER INSERT OR UPDATE OR DELETE ON search_words DEFERRABLE INITIALLY DEFERRED FOR EACH ROW EXECUTE FUNCTION search_vocabulary_bump();
--> statement-breakpoint
-- Shops that already have words start at their number of words (any value would do: it only has to move).
INSERT INTO search_vocabularies (shop_id, version) SELECT shop_id, count(*) FROM search_words GROUP BY shop_id;
