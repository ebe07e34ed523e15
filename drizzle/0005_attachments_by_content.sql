CREATE TABLE "trace_mappings" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"lab_id" uuid NOT NULL,
	"layout_key" text NOT NULL,
	"columns" text[] NOT NULL,
	"mapping" jsonb NOT NULL,
	"created_by_id" uuid NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "trace_mappings_lab_layout_unique" UNIQUE("lab_id","layout_key")
);
--> statement-breakpoint
ALTER TABLE "attachments" DROP CONSTRAINT "attachments_size_nonnegative";--> statement-breakpoint
ALTER TABLE "attachments" ADD COLUMN "kind" text DEFAULT 'file' NOT NULL;--> statement-breakpoint
ALTER TABLE "attachments" ADD COLUMN "derivatives" jsonb DEFAULT '{}'::jsonb NOT NULL;--> statement-breakpoint
ALTER TABLE "trace_mappings" ADD CONSTRAINT "trace_mappings_lab_id_labs_id_fk" FOREIGN KEY ("lab_id") REFERENCES "public"."labs"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "trace_mappings" ADD CONSTRAINT "trace_mappings_created_by_id_users_id_fk" FOREIGN KEY ("created_by_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "attachments_entry_sha256_unique" ON "attachments" USING btree ("entry_id","sha256");--> statement-breakpoint
ALTER TABLE "attachments" ADD CONSTRAINT "attachments_size_positive" CHECK ("attachments"."size_bytes" > 0);--> statement-breakpoint
ALTER TABLE "attachments" ADD CONSTRAINT "attachments_kind_valid" CHECK (kind in ('photo','trace','file'));--> statement-breakpoint
-- An attachment row is part of the record: a countersigned revision's files never change or go.
CREATE TRIGGER attachments_immutable BEFORE UPDATE OR DELETE ON attachments
  FOR EACH ROW EXECUTE FUNCTION ionleaf_refuse_change();
