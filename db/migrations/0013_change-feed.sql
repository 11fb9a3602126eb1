-- The change feed (db/changes.ts): after a statement changes users or shops, a notice on the channel
-- kerfwise_changes names the table. PostgreSQL delivers it when the transaction commits (never on a rollback);
-- the embedded database's one process listens and drops what it had read from that table. With a PostgreSQL
-- server nobody listens and nothing is kept between requests.
CREATE FUNCTION "kerfwise_notify_change"() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  PERFORM pg_notify('kerfwise_changes', TG_TABLE_NAME);
  RETURN NULL;
END
$$;
--> statement-breakpoint
CREATE TRIGGER "kerfwise_changes_users" AFTER INSERT OR UPDATE OR DELETE OR TRUNCATE ON "users" FOR EACH STATEMENT EXECUTE FUNCTION "kerfwise_notify_change"();
--> statement-breakpoint
CREATE TRIGGER "kerfwise_changes_shops" AFTER INSERT OR UPDATE OR DELETE OR TRUNCATE ON "shops" FOR EACH STATEMENT EXECUTE FUNCTION "kerfwise_notify_change"();
