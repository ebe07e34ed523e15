-- Revisions, their computed solutions and signatures are the notebook's record: once
-- written they never change. The application never issues UPDATE or DELETE on them; this
-- trigger makes the database refuse it too, whoever asks.
CREATE OR REPLACE FUNCTION ionleaf_refuse_change() RETURNS trigger AS $$
BEGIN
  RAISE EXCEPTION 'ionleaf: % rows are immutable (% refused)', TG_TABLE_NAME, TG_OP
    USING ERRCODE = 'integrity_constraint_violation';
END;
$$ LANGUAGE plpgsql;
--> statement-breakpoint
CREATE TRIGGER revisions_immutable BEFORE UPDATE OR DELETE ON revisions
  FOR EACH ROW EXECUTE FUNCTION ionleaf_refuse_change();
--> statement-breakpoint
CREATE TRIGGER signatures_immutable BEFORE UPDATE OR DELETE ON signatures
  FOR EACH ROW EXECUTE FUNCTION ionleaf_refuse_change();
--> statement-breakpoint
CREATE TRIGGER solutions_immutable BEFORE UPDATE OR DELETE ON solutions
  FOR EACH ROW EXECUTE FUNCTION ionleaf_refuse_change();
--> statement-breakpoint
CREATE TRIGGER solution_components_immutable BEFORE UPDATE OR DELETE ON solution_components
  FOR EACH ROW EXECUTE FUNCTION ionleaf_refuse_change();
--> statement-breakpoint
-- TRUNCATE is the test suite's reset and an operator's deliberate act; it is not a row change.
