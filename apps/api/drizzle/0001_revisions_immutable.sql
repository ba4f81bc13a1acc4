-- A saved revision is a record of what was analysed: its model, number, author and time never
-- change. Only the check fields may be filled in once (draft -> checked), and a checked revision
-- may later become issued. This guards the rule in the database as well as in the API.
CREATE FUNCTION beam_revisions_guard_update() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF NEW.beam_id IS DISTINCT FROM OLD.beam_id
     OR NEW.version IS DISTINCT FROM OLD.version
     OR NEW.model IS DISTINCT FROM OLD.model
     OR NEW.author_id IS DISTINCT FROM OLD.author_id
     OR NEW.change_summary IS DISTINCT FROM OLD.change_summary
     OR NEW.created_at IS DISTINCT FROM OLD.created_at THEN
    RAISE EXCEPTION 'beam revision % v% is immutable', OLD.beam_id, OLD.version USING ERRCODE = 'check_violation';
  END IF;
  IF OLD.status <> 'draft' AND (
       NEW.checked_by IS DISTINCT FROM OLD.checked_by
       OR NEW.checked_at IS DISTINCT FROM OLD.checked_at
       OR NEW.check_comment IS DISTINCT FROM OLD.check_comment
       OR NOT (NEW.status = OLD.status OR (OLD.status = 'checked' AND NEW.status = 'issued'))) THEN
    RAISE EXCEPTION 'beam revision % v% is % and cannot change', OLD.beam_id, OLD.version, OLD.status USING ERRCODE = 'check_violation';
  END IF;
  RETURN NEW;
END;
$$;
--> statement-breakpoint
CREATE TRIGGER beam_revisions_immutable BEFORE UPDATE ON beam_revisions
  FOR EACH ROW EXECUTE FUNCTION beam_revisions_guard_update();
--> statement-breakpoint
CREATE FUNCTION revision_results_guard_update() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  RAISE EXCEPTION 'a revision result is immutable' USING ERRCODE = 'check_violation';
END;
$$;
--> statement-breakpoint
CREATE TRIGGER revision_results_immutable BEFORE UPDATE ON revision_results
  FOR EACH ROW EXECUTE FUNCTION revision_results_guard_update();
