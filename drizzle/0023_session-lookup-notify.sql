-- Any write to what a request's session lookup reads (the session, its user, the user's memberships
-- and their shops' names) is told on the channel session_lookup at commit. The embedded database's
-- one process listens and forgets its kept lookups then (src/services/session-lookup.ts), instead of
-- after every write request; on a PostgreSQL server nobody listens and the notification is dropped.
CREATE FUNCTION session_lookup_changed() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  PERFORM pg_notify('session_lookup', TG_TABLE_NAME);
  RETURN NULL;
END $$;
--> statement-breakpoint
CREATE TRIGGER session_lookup_session AFTER INSERT OR UPDATE OR DELETE OR TRUNCATE ON "session" FOR EACH STATEMENT EXECUTE FUNCTION session_lookup_changed();
--> statement-breakpoint
CREATE TRIGGER session_lookup_user AFTER INSERT OR UPDATE OR DELETE OR TRUNCATE ON "user" FOR EACH STATEMENT EXECUTE FUNCTION session_lookup_changed();
--> statement-breakpoint
CREATE TRIGGER session_lookup_member AFTER INSERT OR UPDATE OR DELETE OR TRUNCATE ON "member" FOR EACH STATEMENT EXECUTE FUNCTION session_lookup_changed();
--> statement-breakpoint
CREATE TRIGGER session_lookup_organization AFTER INSERT OR UPDATE OR DELETE OR TRUNCATE ON "organization" FOR EACH STATEMENT EXECUTE FUNCTION session_lookup_changed();
