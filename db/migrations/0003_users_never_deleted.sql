-- People are never deleted: their runs, reviews and audit entries stay attributed. Admins
-- deactivate instead (users.active = false).
CREATE FUNCTION users_refuse_delete() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  RAISE EXCEPTION 'users are never deleted: deactivate the account instead' USING ERRCODE = 'insufficient_privilege';
END;
$$;
--> statement-breakpoint
CREATE TRIGGER users_never_deleted
  BEFORE DELETE ON users
  FOR EACH ROW EXECUTE FUNCTION users_refuse_delete();
--> statement-breakpoint
CREATE TRIGGER users_no_truncate
  BEFORE TRUNCATE ON users
  FOR EACH STATEMENT EXECUTE FUNCTION users_refuse_delete();
