-- The built-in hazard thresholds are version 1 (shared/safety.ts DEFAULT_THRESHOLDS; a unit test
-- keeps the two equal). Threshold versions, review events and run releases are history: never
-- updated or deleted. A review's row keeps what it was opened on; only its status and decision move.
INSERT INTO hazard_thresholds (version, values, note, created_by)
VALUES (1, '{"cyanideMinPh":11,"hcnFractionMax":0.02,"thiosulfateMinPh":4,"ammoniaVapourMolPerL":0.05,"deskAmmoniacalSilver":true,"deskAcidifiedThiosulfate":false}'::jsonb,
        'Built-in defaults (common practice).', NULL);
--> statement-breakpoint
CREATE FUNCTION safety_history_refuse() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  RAISE EXCEPTION '% rows are history: they are never changed or deleted', TG_TABLE_NAME USING ERRCODE = 'insufficient_privilege';
END;
$$;
--> statement-breakpoint
CREATE TRIGGER hazard_thresholds_kept BEFORE UPDATE OR DELETE ON hazard_thresholds FOR EACH ROW EXECUTE FUNCTION safety_history_refuse();
--> statement-breakpoint
CREATE TRIGGER hazard_thresholds_no_truncate BEFORE TRUNCATE ON hazard_thresholds FOR EACH STATEMENT EXECUTE FUNCTION safety_history_refuse();
--> statement-breakpoint
CREATE TRIGGER safety_review_events_kept BEFORE UPDATE OR DELETE ON safety_review_events FOR EACH ROW EXECUTE FUNCTION safety_history_refuse();
--> statement-breakpoint
CREATE TRIGGER safety_review_events_no_truncate BEFORE TRUNCATE ON safety_review_events FOR EACH STATEMENT EXECUTE FUNCTION safety_history_refuse();
--> statement-breakpoint
CREATE TRIGGER run_releases_kept BEFORE UPDATE OR DELETE ON run_releases FOR EACH ROW EXECUTE FUNCTION safety_history_refuse();
--> statement-breakpoint
CREATE TRIGGER run_releases_no_truncate BEFORE TRUNCATE ON run_releases FOR EACH STATEMENT EXECUTE FUNCTION safety_history_refuse();
--> statement-breakpoint
CREATE TRIGGER safety_reviews_never_deleted BEFORE DELETE ON safety_reviews FOR EACH ROW EXECUTE FUNCTION safety_history_refuse();
--> statement-breakpoint
CREATE TRIGGER safety_reviews_no_truncate BEFORE TRUNCATE ON safety_reviews FOR EACH STATEMENT EXECUTE FUNCTION safety_history_refuse();
--> statement-breakpoint
CREATE FUNCTION safety_reviews_decision_only() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF NEW.id IS DISTINCT FROM OLD.id OR NEW.subject_kind IS DISTINCT FROM OLD.subject_kind
     OR NEW.run_id IS DISTINCT FROM OLD.run_id OR NEW.bath_id IS DISTINCT FROM OLD.bath_id
     OR NEW.hazards IS DISTINCT FROM OLD.hazards OR NEW.flags IS DISTINCT FROM OLD.flags
     OR NEW.thresholds_version IS DISTINCT FROM OLD.thresholds_version
     OR NEW.submitted_by IS DISTINCT FROM OLD.submitted_by OR NEW.submitted_at IS DISTINCT FROM OLD.submitted_at THEN
    RAISE EXCEPTION 'a safety review keeps what it was opened on; only its status and decision change' USING ERRCODE = 'insufficient_privilege';
  END IF;
  RETURN NEW;
END;
$$;
--> statement-breakpoint
CREATE TRIGGER safety_reviews_decision_only BEFORE UPDATE ON safety_reviews FOR EACH ROW EXECUTE FUNCTION safety_reviews_decision_only();
