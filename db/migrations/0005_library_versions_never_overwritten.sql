-- Library rows are never overwritten or deleted. A constant's values are fixed at insert; only
-- its status moves forward (draft -> approved | rejected, approved -> retired) with the review
-- and retirement columns. Reaction terms and species formulas never change.
CREATE FUNCTION constants_guard() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF TG_OP = 'DELETE' THEN
    RAISE EXCEPTION 'constants are never deleted: retire the version instead' USING ERRCODE = 'insufficient_privilege';
  END IF;
  IF (NEW.lineage_id, NEW.version, NEW.replaces_id, NEW.kind, NEW.reaction, NEW.reaction_key, NEW.defines_species_id,
      NEW.log_value, NEW.uncertainty, NEW.temperature_c, NEW.ionic_strength, NEW.medium, NEW.enthalpy_kj_mol,
      NEW.source, NEW.note, NEW.proposed_by, NEW.proposed_at)
     IS DISTINCT FROM
     (OLD.lineage_id, OLD.version, OLD.replaces_id, OLD.kind, OLD.reaction, OLD.reaction_key, OLD.defines_species_id,
      OLD.log_value, OLD.uncertainty, OLD.temperature_c, OLD.ionic_strength, OLD.medium, OLD.enthalpy_kj_mol,
      OLD.source, OLD.note, OLD.proposed_by, OLD.proposed_at) THEN
    RAISE EXCEPTION 'a constant version is never overwritten: propose a revision instead' USING ERRCODE = 'insufficient_privilege';
  END IF;
  IF NEW.status IS DISTINCT FROM OLD.status AND NOT (
       (OLD.status = 'draft' AND NEW.status IN ('approved', 'rejected'))
    OR (OLD.status = 'approved' AND NEW.status = 'retired')) THEN
    RAISE EXCEPTION 'a constant cannot go from % to %', OLD.status, NEW.status USING ERRCODE = 'check_violation';
  END IF;
  RETURN NEW;
END;
$$;
--> statement-breakpoint
CREATE TRIGGER constants_never_overwritten
  BEFORE UPDATE OR DELETE ON constants
  FOR EACH ROW EXECUTE FUNCTION constants_guard();
--> statement-breakpoint
CREATE FUNCTION library_refuse_change() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  RAISE EXCEPTION '% rows are never changed or deleted', TG_TABLE_NAME USING ERRCODE = 'insufficient_privilege';
END;
$$;
--> statement-breakpoint
CREATE TRIGGER constant_terms_fixed
  BEFORE UPDATE OR DELETE ON constant_terms
  FOR EACH ROW EXECUTE FUNCTION library_refuse_change();
--> statement-breakpoint
CREATE TRIGGER run_constants_fixed
  BEFORE UPDATE OR DELETE ON run_constants
  FOR EACH ROW EXECUTE FUNCTION library_refuse_change();
--> statement-breakpoint
CREATE FUNCTION species_guard() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF TG_OP = 'DELETE' THEN
    RAISE EXCEPTION 'species are never deleted' USING ERRCODE = 'insufficient_privilege';
  END IF;
  IF (NEW.formula, NEW.charge, NEW.molar_mass, NEW.role) IS DISTINCT FROM (OLD.formula, OLD.charge, OLD.molar_mass, OLD.role) THEN
    RAISE EXCEPTION 'a species formula, charge, molar mass and role never change' USING ERRCODE = 'insufficient_privilege';
  END IF;
  RETURN NEW;
END;
$$;
--> statement-breakpoint
CREATE TRIGGER species_fixed
  BEFORE UPDATE OR DELETE ON species
  FOR EACH ROW EXECUTE FUNCTION species_guard();
--> statement-breakpoint
CREATE TRIGGER library_no_truncate_constants BEFORE TRUNCATE ON constants FOR EACH STATEMENT EXECUTE FUNCTION library_refuse_change();
--> statement-breakpoint
CREATE TRIGGER library_no_truncate_terms BEFORE TRUNCATE ON constant_terms FOR EACH STATEMENT EXECUTE FUNCTION library_refuse_change();
--> statement-breakpoint
CREATE TRIGGER library_no_truncate_species BEFORE TRUNCATE ON species FOR EACH STATEMENT EXECUTE FUNCTION library_refuse_change();
