-- Bath records are never deleted: a bath is archived; analyses and attachments stay with it.
CREATE FUNCTION baths_refuse_delete() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  RAISE EXCEPTION '% rows are never deleted (archive the bath instead)', TG_TABLE_NAME USING ERRCODE = 'insufficient_privilege';
END;
$$;
--> statement-breakpoint
CREATE TRIGGER baths_never_deleted BEFORE DELETE ON baths FOR EACH ROW EXECUTE FUNCTION baths_refuse_delete();
--> statement-breakpoint
CREATE TRIGGER analyses_never_deleted BEFORE DELETE ON analyses FOR EACH ROW EXECUTE FUNCTION baths_refuse_delete();
--> statement-breakpoint
CREATE TRIGGER attachments_never_deleted BEFORE DELETE ON attachments FOR EACH ROW EXECUTE FUNCTION baths_refuse_delete();
--> statement-breakpoint
CREATE TRIGGER baths_no_truncate BEFORE TRUNCATE ON baths FOR EACH STATEMENT EXECUTE FUNCTION baths_refuse_delete();
--> statement-breakpoint
CREATE TRIGGER analyses_no_truncate BEFORE TRUNCATE ON analyses FOR EACH STATEMENT EXECUTE FUNCTION baths_refuse_delete();
--> statement-breakpoint
CREATE TRIGGER attachments_no_truncate BEFORE TRUNCATE ON attachments FOR EACH STATEMENT EXECUTE FUNCTION baths_refuse_delete();
