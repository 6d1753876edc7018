import type { QueryInterface } from 'sequelize';

/**
 * The app processes keep each signed-in session and person in memory for a few seconds
 * (services/signed-in-cache.ts). These triggers tell every process, on commit, which session or
 * person changed, whichever process or script changed it: a session saved or ended, a person
 * edited or deleted, a membership added, changed or removed, a studio renamed or deleted (its
 * members' kept rows carry it). A touch that only pushes a session's
 * expiry on does not change what the session says, and is not told.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.query(`
    CREATE FUNCTION notify_signed_in_change() RETURNS trigger LANGUAGE plpgsql AS $$
    BEGIN
      IF TG_TABLE_NAME = 'session' THEN
        PERFORM pg_notify('cardwright_signed_in', 's:' || OLD.sid);
      ELSIF TG_TABLE_NAME = 'users' THEN
        PERFORM pg_notify('cardwright_signed_in', 'u:' || OLD.id);
      ELSIF TG_TABLE_NAME = 'studios' THEN
        PERFORM pg_notify('cardwright_signed_in', 'st:' || OLD.id);
      ELSE
        IF TG_OP <> 'INSERT' THEN PERFORM pg_notify('cardwright_signed_in', 'u:' || OLD.user_id); END IF;
        IF TG_OP <> 'DELETE' THEN PERFORM pg_notify('cardwright_signed_in', 'u:' || NEW.user_id); END IF;
      END IF;
      RETURN NULL;
    END $$;
    CREATE TRIGGER session_ended AFTER DELETE ON "session" FOR EACH ROW EXECUTE FUNCTION notify_signed_in_change();
    CREATE TRIGGER session_changed AFTER UPDATE ON "session" FOR EACH ROW
      WHEN (OLD.sess::text IS DISTINCT FROM NEW.sess::text) EXECUTE FUNCTION notify_signed_in_change();
    CREATE TRIGGER user_changed AFTER UPDATE OR DELETE ON users FOR EACH ROW EXECUTE FUNCTION notify_signed_in_change();
    CREATE TRIGGER studio_changed AFTER UPDATE OR DELETE ON studios FOR EACH ROW EXECUTE FUNCTION notify_signed_in_change();
    CREATE TRIGGER membership_changed AFTER INSERT OR UPDATE OR DELETE ON memberships FOR EACH ROW EXECUTE FUNCTION notify_signed_in_change();`);
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.query(`
    DROP TRIGGER membership_changed ON memberships;
    DROP TRIGGER studio_changed ON studios;
    DROP TRIGGER user_changed ON users;
    DROP TRIGGER session_changed ON "session";
    DROP TRIGGER session_ended ON "session";
    DROP FUNCTION notify_signed_in_change();`);
}
