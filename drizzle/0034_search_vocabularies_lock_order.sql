-- Custom migration (drizzle-kit generate --custom): the vocabulary bump (0033) takes the shop's
-- shop_revisions row before its own. Both are locked by deferred triggers at commit, in the order the
-- transaction queued its writes: a transaction that wrote a comment (new words) then a confirmation
-- (a new revision) and one that did the reverse would each hold one row and wait for the other. With
-- the revision row always first, the one that takes it first finishes and the other waits. A row at
-- revision 0 reads as no row (db/revision-schema.ts), so making it here changes no revision.
CREATE OR REPLACE FUNCTION search_vocabulary_bump() RETURNS trigger LANGUAGE plpgsql AS $$
DECLARE shop text := CASE WHEN TG_OP = 'DELETE' THEN OLD.shop_id ELSE NEW.shop_id END;
BEGIN
  INSERT INTO shop_revisions (shop_id, revision) VALUES (shop, 0) ON CONFLICT (shop_id) DO NOTHING;
  PERFORM 1 FROM shop_revisions WHERE shop_id = shop FOR UPDATE;
  INSERT INTO search_vocabularies (shop_id, version) VALUES (shop, 1)
  ON CONFLICT (shop_id) DO UPDATE SET version = search_vocabularies.version + 1;
  RETURN NULL;
END $$;
