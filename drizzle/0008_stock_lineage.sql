CREATE TABLE "solution_parents" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"lab_id" uuid NOT NULL,
	"block_result_id" uuid NOT NULL,
	"entry_id" uuid NOT NULL,
	"block_id" text NOT NULL,
	"revision" integer NOT NULL,
	"position" integer NOT NULL,
	"parent_entry_id" uuid NOT NULL,
	"parent_block_id" text NOT NULL,
	"parent_revision" integer NOT NULL,
	"parent_result_id" uuid NOT NULL,
	"volume_ml" double precision NOT NULL,
	"final_volume_ml" double precision NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "solution_parents_block_row_position_unique" UNIQUE("block_result_id","position"),
	CONSTRAINT "solution_parents_revisions_positive" CHECK ("solution_parents"."revision" >= 1 and "solution_parents"."parent_revision" >= 1),
	CONSTRAINT "solution_parents_volumes_valid" CHECK ("solution_parents"."volume_ml" > 0 and "solution_parents"."final_volume_ml" >= "solution_parents"."volume_ml")
);
--> statement-breakpoint
ALTER TABLE "solution_parents" ADD CONSTRAINT "solution_parents_lab_id_labs_id_fk" FOREIGN KEY ("lab_id") REFERENCES "public"."labs"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "solution_parents" ADD CONSTRAINT "solution_parents_block_result_id_block_results_id_fk" FOREIGN KEY ("block_result_id") REFERENCES "public"."block_results"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "solution_parents" ADD CONSTRAINT "solution_parents_entry_id_entries_id_fk" FOREIGN KEY ("entry_id") REFERENCES "public"."entries"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "solution_parents" ADD CONSTRAINT "solution_parents_parent_entry_id_entries_id_fk" FOREIGN KEY ("parent_entry_id") REFERENCES "public"."entries"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "solution_parents" ADD CONSTRAINT "solution_parents_parent_result_id_solution_results_id_fk" FOREIGN KEY ("parent_result_id") REFERENCES "public"."solution_results"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "solution_parents_lab_parent_idx" ON "solution_parents" USING btree ("lab_id","parent_entry_id","parent_block_id");--> statement-breakpoint
CREATE INDEX "solution_parents_entry_idx" ON "solution_parents" USING btree ("entry_id");