-- Custom migration (drizzle-kit generate --custom): every write a diagnosis depends on raises the shop's
-- revision in shop_revisions, inside the writing transaction, so a cached rule set and calibration
-- (server/rulebook/context.ts) is known to be stale on every server the moment the write commits.
-- Constraint triggers deferred to commit: the revision row is locked last, after every other lock the
-- transaction takes, so two writers can never wait on each other through it (statement triggers,
-- which lock it mid-transaction, deadlocked simultaneous rule saves that also lock the rule's row).
CREATE FUNCTION shop_revision_bump(shop text) RETURNS void LANGUAGE sql AS $$
  INSERT INTO shop_revisions (shop_id, revision) VALUES (shop, 1)
  ON CONFLICT (shop_id) DO UPDATE SET revision = shop_revisions.revision + 1;
$$;
--> statement-breakpoint
CREATE FUNCTION shop_revision_confirmed(shop text, casting integer) RETURNS boolean LANGUAGE sql STABLE AS $$
  SELECT EXISTS (SELECT 1 FROM confirmations c WHERE c.shop_id = shop AND c.casting_id = casting);
$$;
--> statement-breakpoint
-- Tables whose every row counts: the shop's rules and their versions, its causes, its switched-off
-- built-ins, and the mentors' confirmations.
CREATE FUNCTION shop_revision_rows() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF TG_OP = 'DELETE' THEN
    PERFORM shop_revision_bump(OLD.shop_id);
  ELSE
    PERFORM shop_revision_bump(NEW.shop_id);
  END IF;
  RETURN NULL;
END $$;
--> statement-breakpoint
-- A casting counts once a mentor has confirmed its cause (the calibration reads only those); a new or
-- edited unconfirmed casting leaves the cache alone. Deleting a confirmed casting deletes its
-- confirmations, whose own trigger counts it.
CREATE FUNCTION shop_revision_castings() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF shop_revision_confirmed(NEW.shop_id, NEW.id) THEN PERFORM shop_revision_bump(NEW.shop_id); END IF;
  RETURN NULL;
END $$;
--> statement-breakpoint
CREATE FUNCTION shop_revision_marks() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF TG_OP = 'DELETE' THEN
    IF shop_revision_confirmed(OLD.shop_id, OLD.casting_id) THEN PERFORM shop_revision_bump(OLD.shop_id); END IF;
  ELSIF shop_revision_confirmed(NEW.shop_id, NEW.casting_id) THEN
    PERFORM shop_revision_bump(NEW.shop_id);
  END IF;
  RETURN NULL;
END $$;
--> statement-breakpoint
-- A melt's conditions are part of each of its castings.
CREATE FUNCTION shop_revision_melts() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF EXISTS (SELECT 1 FROM castings k WHERE k.melt_id = NEW.id AND shop_revision_confirmed(k.shop_id, k.id)) THEN
    PERFORM shop_revision_bump(NEW.shop_id);
  END IF;
  RETURN NULL;
END $$;
--> statement-breakpoint
-- An alloy's figures (liquidus, family...) can be updated in place; the built-ins are upserted at every
-- server start with the same figures, so only a row that really changed counts, in every shop with a
-- confirmed casting poured in it (shops in one order, so two such updates cannot deadlock either).
CREATE FUNCTION shop_revision_alloys() RETURNS trigger LANGUAGE plpgsql AS $$
DECLARE shop text;
BEGIN
  IF ROW(OLD.*) IS DISTINCT FROM ROW(NEW.*) THEN
    FOR shop IN
      SELECT DISTINCT k.shop_id FROM melts m JOIN castings k ON k.melt_id = m.id
      WHERE m.alloy_id = NEW.id AND shop_revision_confirmed(k.shop_id, k.id) ORDER BY 1
    LOOP
      PERFORM shop_revision_bump(shop);
    END LOOP;
  END IF;
  RETURN NULL;
END $$;
--> statement-breakpoint
CREATE CONSTRAINT TRIGGER shop_revision_shop_rules AFTER INSERT OR DELETE ON shop_rules DEFERRABLE INITIALLY DEFERRED FOR EACH ROW EXECUTE FUNCTION shop_revision_rows();
--> statement-breakpoint
CREATE CONSTRAINT TRIGGER shop_revision_versions AFTER INSERT OR UPDATE OR DELETE ON shop_rule_versions DEFERRABLE INITIALLY DEFERRED FOR EACH ROW EXECUTE FUNCTION shop_revision_rows();
--> statement-breakpoint
CREATE CONSTRAINT TRIGGER shop_revision_causes AFTER INSERT OR UPDATE OR DELETE ON shop_causes DEFERRABLE INITIALLY DEFERRED FOR EACH ROW EXECUTE FUNCTION shop_revision_rows();
--> statement-breakpoint
CREATE CONSTRAINT TRIGGER shop_revision_switches AFTER INSERT OR UPDATE OR DELETE ON rule_switches DEFERRABLE INITIALLY DEFERRED FOR EACH ROW EXECUTE FUNCTION shop_revision_rows();
--> statement-breakpoint
CREATE CONSTRAINT TRIGGER shop_revision_confirmations AFTER INSERT OR UPDATE OR DELETE ON confirmations DEFERRABLE INITIALLY DEFERRED FOR EACH ROW EXECUTE FUNCTION shop_revision_rows();
--> statement-breakpoint
CREATE CONSTRAINT TRIGGER shop_revision_castings AFTER UPDATE ON castings DEFERRABLE INITIALLY DEFERRED FOR EACH ROW EXECUTE FUNCTION shop_revision_castings();
--> statement-breakpoint
CREATE CONSTRAINT TRIGGER shop_revision_marks AFTER INSERT OR UPDATE OR DELETE ON defect_marks DEFERRABLE INITIALLY DEFERRED FOR EACH ROW EXECUTE FUNCTION shop_revision_marks();
--> statement-breakpoint
CREATE CONSTRAINT TRIGGER shop_revision_melts AFTER UPDATE ON melts DEFERRABLE INITIALLY DEFERRED FOR EACH ROW EXECUTE FUNCTION shop_revision_melts();
--> statement-breakpoint
CREATE CONSTRAINT TRIGGER shop_revision_alloys AFTER UPDATE ON alloys DEFERRABLE INITIALLY DEFERRED FOR EACH ROW EXECUTE FUNCTION shop_revision_alloys();
