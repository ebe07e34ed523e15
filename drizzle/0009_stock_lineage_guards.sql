-- Lineage links are part of the record: a revision's stocks (which solution block, which
-- revision of it, how much) never change once saved, whether the revision is a draft or
-- countersigned. Every UPDATE and DELETE is refused.
CREATE TRIGGER solution_parents_immutable BEFORE UPDATE OR DELETE ON solution_parents
  FOR EACH ROW EXECUTE FUNCTION ionleaf_refuse_change();
--> statement-breakpoint
-- A stock is always a solution of the same lab as the block made from it, and the link's
-- child is the block row it names: checked here too, whoever inserts.
CREATE OR REPLACE FUNCTION ionleaf_solution_parents_same_lab() RETURNS trigger AS $$
BEGIN
  IF NOT EXISTS (SELECT 1 FROM entries e WHERE e.id = NEW.parent_entry_id AND e.lab_id = NEW.lab_id)
     OR NOT EXISTS (SELECT 1 FROM block_results b
                    WHERE b.id = NEW.block_result_id AND b.lab_id = NEW.lab_id
                      AND b.entry_id = NEW.entry_id AND b.block_id = NEW.block_id
                      AND b.from_revision = NEW.revision)
     OR NOT EXISTS (SELECT 1 FROM solution_results r WHERE r.id = NEW.parent_result_id AND r.lab_id = NEW.lab_id) THEN
    RAISE EXCEPTION 'ionleaf: a stock must be a solution of the same lab as the block made from it'
      USING ERRCODE = 'integrity_constraint_violation';
  END IF;
  RETURN NEW;
END;
$$ LANGUAGE plpgsql;
--> statement-breakpoint
CREATE TRIGGER solution_parents_same_lab BEFORE INSERT ON solution_parents
  FOR EACH ROW EXECUTE FUNCTION ionleaf_solution_parents_same_lab();
