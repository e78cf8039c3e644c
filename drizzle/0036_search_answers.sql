-- Custom migration (drizzle-kit generate --custom): every search document written or removed raises
-- its shop's version in search_document_versions, so a server's kept search answers
-- (server/search/answers.ts), kept under (shop, documents version, shop revision), are known to be
-- stale on every server the moment the write commits. Deferred to commit, and the shop's
-- shop_revisions row taken first, as the vocabulary bump does (0034): the rows are always locked in
-- one order, so two writers cannot wait on each other through them.
CREATE FUNCTION search_documents_bump() RETURNS trigger LANGUAGE plpgsql AS $$
DECLARE shop text := CASE WHEN TG_OP = 'DELETE' THEN OLD.shop_id ELSE NEW.shop_id END;
BEGIN
  INSERT INTO shop_revisions (shop_id, revision) VALUES (shop, 0) ON CONFLICT (shop_id) DO NOTHING;
  PERFORM 1 FROM shop_revisions WHERE shop_id = shop FOR UPDATE;
  INSERT INTO search_document_versions (shop_id, version) VALUES (shop, 1)
  ON CONFLICT (shop_id) DO UPDATE SET version = search_document_versions.version + 1;
  -- A document moved to another shop (never done today) changes that shop's answers too.
  IF TG_OP = 'UPDATE' AND OLD.shop_id <> NEW.shop_id THEN
    INSERT INTO search_document_versions (shop_id, version) VALUES (OLD.shop_id, 1)
    ON CONFLICT (shop_id) DO UPDATE SET version = search_document_versions.version + 1;
  END IF;
  RETURN NULL;
END $$;
--> statement-breakpoint
CREATE CONSTRAINT TRIGGER search_documents_versions AFTER INSERT OR UPDATE OR DELETE ON search_documents DEFERRABLE INITIALLY DEFERRED FOR EACH ROW EXECUTE FUNCTION search_documents_bump();
--> statement-breakpoint
INSERT INTO search_document_versions (shop_id, version) SELECT shop_id, count(*) FROM search_documents GROUP BY shop_id;
