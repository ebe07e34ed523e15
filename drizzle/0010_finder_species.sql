CREATE TABLE "block_species" (
	"block_result_id" uuid NOT NULL,
	"lab_id" uuid NOT NULL,
	"species" text NOT NULL,
	"ionic_strength_molal" double precision,
	"ionic_strength_molar" double precision,
	"entry_id" uuid NOT NULL,
	"created_at" timestamp with time zone NOT NULL,
	CONSTRAINT "block_species_pkey" PRIMARY KEY("block_result_id","species")
);
--> statement-breakpoint
ALTER TABLE "block_species" ADD CONSTRAINT "block_species_block_result_id_block_results_id_fk" FOREIGN KEY ("block_result_id") REFERENCES "public"."block_results"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
-- block_species follows the open block rows: rows inserted open add one row per species,
-- closing a row removes its species. Statement-level, so a save of many blocks is one INSERT
-- and one DELETE. SECURITY DEFINER because the application role may only read block_species
-- (db/app-role-privileges.ts) and deletes nothing anywhere. The block_results guard lets an
-- UPDATE through only when it closes an open row, so every updated row here was closed.
CREATE OR REPLACE FUNCTION ionleaf_block_species_open() RETURNS trigger
  LANGUAGE plpgsql SECURITY DEFINER SET search_path = public, pg_temp AS $$
BEGIN
  INSERT INTO block_species (block_result_id, lab_id, species, ionic_strength_molal,
                             ionic_strength_molar, entry_id, created_at)
  SELECT DISTINCT b.id, b.lab_id, s.species, b.ionic_strength_molal, b.ionic_strength_molar,
         b.entry_id, b.created_at
    FROM inserted_rows b CROSS JOIN LATERAL unnest(b.species) AS s(species)
   WHERE b.to_revision IS NULL AND s.species IS NOT NULL;
  RETURN NULL;
END;
$$;
--> statement-breakpoint
CREATE TRIGGER block_results_species_open AFTER INSERT ON block_results
  REFERENCING NEW TABLE AS inserted_rows
  FOR EACH STATEMENT EXECUTE FUNCTION ionleaf_block_species_open();
--> statement-breakpoint
CREATE OR REPLACE FUNCTION ionleaf_block_species_close() RETURNS trigger
  LANGUAGE plpgsql SECURITY DEFINER SET search_path = public, pg_temp AS $$
BEGIN
  DELETE FROM block_species s
   USING closed_rows c
   WHERE s.block_result_id = c.id AND c.to_revision IS NOT NULL;
  RETURN NULL;
END;
$$;
--> statement-breakpoint
CREATE TRIGGER block_results_species_close AFTER UPDATE ON block_results
  REFERENCING NEW TABLE AS closed_rows
  FOR EACH STATEMENT EXECUTE FUNCTION ionleaf_block_species_close();
--> statement-breakpoint
-- The open rows saved before this migration.
INSERT INTO block_species (block_result_id, lab_id, species, ionic_strength_molal,
                           ionic_strength_molar, entry_id, created_at)
SELECT DISTINCT b.id, b.lab_id, s.species, b.ionic_strength_molal, b.ionic_strength_molar,
       b.entry_id, b.created_at
  FROM block_results b CROSS JOIN LATERAL unnest(b.species) AS s(species)
 WHERE b.to_revision IS NULL AND s.species IS NOT NULL;
--> statement-breakpoint
-- Range + species on either scale, answered from the index alone: the rows of one species in
-- the ionic-strength window, with what the search filters on and returns (Drizzle cannot
-- declare INCLUDE, so they are written here and named in db/schema/notebook.ts).
CREATE INDEX "block_species_molal_idx" ON "block_species" USING btree ("lab_id","species","ionic_strength_molal") INCLUDE ("created_at","entry_id","block_result_id");--> statement-breakpoint
CREATE INDEX "block_species_molar_idx" ON "block_species" USING btree ("lab_id","species","ionic_strength_molar") INCLUDE ("created_at","entry_id","block_result_id");
