-- library_revision goes up with every statement that changes what the system builder reads
-- (species, constants, constant_terms), inside the writing transaction: a reader that sees the new
-- number sees the new rows too. The server keeps the builder's view in memory, keyed on it.
INSERT INTO library_revision (id, revision) VALUES (1, 1);
--> statement-breakpoint
CREATE FUNCTION library_revision_bump() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  UPDATE library_revision SET revision = revision + 1 WHERE id = 1;
  RETURN NULL;
END;
$$;
--> statement-breakpoint
CREATE TRIGGER species_bump_revision AFTER INSERT OR UPDATE OR DELETE OR TRUNCATE ON species FOR EACH STATEMENT EXECUTE FUNCTION library_revision_bump();
--> statement-breakpoint
CREATE TRIGGER constants_bump_revision AFTER INSERT OR UPDATE OR DELETE OR TRUNCATE ON constants FOR EACH STATEMENT EXECUTE FUNCTION library_revision_bump();
--> statement-breakpoint
CREATE TRIGGER constant_terms_bump_revision AFTER INSERT OR UPDATE OR DELETE OR TRUNCATE ON constant_terms FOR EACH STATEMENT EXECUTE FUNCTION library_revision_bump();
--> statement-breakpoint
-- The counter itself only ever goes up: its one row is never deleted, renumbered or moved back.
CREATE FUNCTION library_revision_forward_only() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF TG_OP = 'UPDATE' THEN
    IF NEW.id = OLD.id AND NEW.revision > OLD.revision THEN
      RETURN NEW;
    END IF;
  END IF;
  RAISE EXCEPTION 'library_revision only counts up' USING ERRCODE = 'insufficient_privilege';
END;
$$;
--> statement-breakpoint
CREATE TRIGGER library_revision_forward BEFORE UPDATE OR DELETE ON library_revision FOR EACH ROW EXECUTE FUNCTION library_revision_forward_only();
--> statement-breakpoint
CREATE TRIGGER library_revision_no_truncate BEFORE TRUNCATE ON library_revision FOR EACH STATEMENT EXECUTE FUNCTION library_revision_forward_only();
