DROP INDEX "block_results_current_ionic_strength_idx";--> statement-breakpoint
DROP INDEX "block_results_current_ionic_strength_molar_idx";--> statement-breakpoint
DROP INDEX "block_results_lab_ionic_strength_idx";--> statement-breakpoint
DROP INDEX "entries_title_fts_idx";--> statement-breakpoint
DROP INDEX "revisions_text_fts_idx";--> statement-breakpoint
CREATE INDEX "block_results_current_entry_idx" ON "block_results" USING btree ("entry_id") WHERE "block_results"."to_revision" is null;--> statement-breakpoint
CREATE INDEX "block_results_closed_ionic_strength_idx" ON "block_results" USING btree ("lab_id","ionic_strength_molal") WHERE "block_results"."to_revision" is not null;--> statement-breakpoint
CREATE INDEX "block_results_closed_ionic_strength_molar_idx" ON "block_results" USING btree ("lab_id","ionic_strength_molar") WHERE "block_results"."to_revision" is not null;--> statement-breakpoint
CREATE INDEX "block_results_closed_species_idx" ON "block_results" USING gin ("species") WHERE "block_results"."to_revision" is not null;--> statement-breakpoint
CREATE INDEX "block_results_closed_created_idx" ON "block_results" USING btree ("lab_id","created_at") WHERE "block_results"."to_revision" is not null;--> statement-breakpoint
CREATE INDEX "entries_lab_status_idx" ON "entries" USING btree ("lab_id","status");--> statement-breakpoint
CREATE INDEX "entries_archived_idx" ON "entries" USING btree ("id") WHERE "entries"."archived_at" is not null;--> statement-breakpoint
CREATE INDEX "revisions_search_idx" ON "revisions" USING gin (to_tsvector('english', "title" || ' ' || "content_text"));--> statement-breakpoint
-- Covering partial indexes for the solution finder (Drizzle cannot declare INCLUDE, so they
-- live here and are named in db/schema/notebook.ts). A range + species query on the current
-- solutions filters the species and collects entry, date and id from the index alone.
CREATE INDEX "block_results_current_molal_idx" ON "block_results" USING btree ("lab_id","ionic_strength_molal") INCLUDE ("species","entry_id","created_at","id") WHERE "block_results"."to_revision" is null;--> statement-breakpoint
CREATE INDEX "block_results_current_molar_idx" ON "block_results" USING btree ("lab_id","ionic_strength_molar") INCLUDE ("species","entry_id","created_at","id") WHERE "block_results"."to_revision" is null;
