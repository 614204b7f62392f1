-- Server processes cache validated sessions briefly (server/modules/auth/session-cache.ts) and
-- LISTEN on this channel: every change that could answer a signed-in request differently notifies
-- it with the user's id, at commit, whichever code or process made it.
CREATE FUNCTION notify_auth_change() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF TG_TABLE_NAME = 'sessions' THEN
    PERFORM pg_notify('eavesight_auth_change', OLD.user_id);
  ELSE
    PERFORM pg_notify('eavesight_auth_change', OLD.id);
  END IF;
  RETURN NULL;
END $$;
--> statement-breakpoint
-- A session ends (sign-out, sign-out everywhere, password change, deactivation) or is cut short.
-- lucia's sliding extension only moves expires_at later and notifies no one.
CREATE TRIGGER sessions_auth_change_delete AFTER DELETE ON sessions
  FOR EACH ROW EXECUTE FUNCTION notify_auth_change();
--> statement-breakpoint
CREATE TRIGGER sessions_auth_change_update AFTER UPDATE ON sessions
  FOR EACH ROW WHEN (NEW.expires_at < OLD.expires_at OR NEW.absolute_expires_at IS DISTINCT FROM OLD.absolute_expires_at OR NEW.user_id IS DISTINCT FROM OLD.user_id)
  EXECUTE FUNCTION notify_auth_change();
--> statement-breakpoint
-- What a request's actor is made of: role, activity, company, e-mail, name.
CREATE TRIGGER users_auth_change_update AFTER UPDATE ON users
  FOR EACH ROW WHEN (NEW.role IS DISTINCT FROM OLD.role OR NEW.is_active IS DISTINCT FROM OLD.is_active
    OR NEW.company_id IS DISTINCT FROM OLD.company_id OR NEW.email IS DISTINCT FROM OLD.email OR NEW.name IS DISTINCT FROM OLD.name)
  EXECUTE FUNCTION notify_auth_change();
--> statement-breakpoint
CREATE TRIGGER users_auth_change_delete AFTER DELETE ON users
  FOR EACH ROW EXECUTE FUNCTION notify_auth_change();
