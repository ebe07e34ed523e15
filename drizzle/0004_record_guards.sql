-- The notebook's record, guarded by the database whoever connects.
-- Stored solution results never change: a revision shows forever the numbers computed when
-- it was saved.
CREATE TRIGGER solution_results_immutable BEFORE UPDATE OR DELETE ON solution_results
  FOR EACH ROW EXECUTE FUNCTION ionleaf_refuse_change();
--> statement-breakpoint
-- A block row may only be closed, once: to_revision goes from NULL to a later revision and
-- nothing else changes. Every other UPDATE, and every DELETE, is refused.
CREATE OR REPLACE FUNCTION ionleaf_block_results_guard() RETURNS trigger AS $$
BEGIN
  IF TG_OP = 'UPDATE'
     AND OLD.to_revision IS NULL
     AND NEW.to_revision IS NOT NULL
     AND (to_jsonb(NEW) - 'to_revision') = (to_jsonb(OLD) - 'to_revision') THEN
    RETURN NEW;
  END IF;
  RAISE EXCEPTION 'ionleaf: block_results rows are immutable except closing an open row (% refused)', TG_OP
    USING ERRCODE = 'integrity_constraint_violation';
END;
$$ LANGUAGE plpgsql;
--> statement-breakpoint
CREATE TRIGGER block_results_guard BEFORE UPDATE OR DELETE ON block_results
  FOR EACH ROW EXECUTE FUNCTION ionleaf_block_results_guard();
--> statement-breakpoint
-- The audit trail is append-only.
CREATE TRIGGER audit_events_append_only BEFORE UPDATE OR DELETE ON audit_events
  FOR EACH ROW EXECUTE FUNCTION ionleaf_refuse_change();
--> statement-breakpoint
-- A countersigned entry's signed revision number only moves forward, and an entry that has
-- been countersigned never loses its signature record.
CREATE OR REPLACE FUNCTION ionleaf_entries_guard() RETURNS trigger AS $$
BEGIN
  IF OLD.signed_revision_number IS NOT NULL
     AND (NEW.signed_revision_number IS NULL OR NEW.signed_revision_number < OLD.signed_revision_number) THEN
    RAISE EXCEPTION 'ionleaf: the signed revision of an entry cannot move back'
      USING ERRCODE = 'integrity_constraint_violation';
  END IF;
  IF NEW.current_revision_number < OLD.current_revision_number THEN
    RAISE EXCEPTION 'ionleaf: an entry cannot go back to an older revision'
      USING ERRCODE = 'integrity_constraint_violation';
  END IF;
  RETURN NEW;
END;
$$ LANGUAGE plpgsql;
--> statement-breakpoint
CREATE TRIGGER entries_guard BEFORE UPDATE ON entries
  FOR EACH ROW EXECUTE FUNCTION ionleaf_entries_guard();
--> statement-breakpoint
CREATE TRIGGER entries_no_delete BEFORE DELETE ON entries
  FOR EACH ROW EXECUTE FUNCTION ionleaf_refuse_change();
