CREATE TABLE "block_results" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"lab_id" uuid NOT NULL,
	"entry_id" uuid NOT NULL,
	"block_id" text NOT NULL,
	"result_id" uuid NOT NULL,
	"from_revision" integer NOT NULL,
	"to_revision" integer,
	"position" integer NOT NULL,
	"name" text DEFAULT '' NOT NULL,
	"temperature_c" double precision NOT NULL,
	"solvent" text NOT NULL,
	"model_used" text,
	"ionic_strength_molal" double precision,
	"ionic_strength_molar" double precision,
	"debye_length_nm" double precision,
	"species" text[] DEFAULT '{}'::text[] NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "block_results_entry_block_from_unique" UNIQUE("entry_id","block_id","from_revision"),
	CONSTRAINT "block_results_from_positive" CHECK ("block_results"."from_revision" >= 1),
	CONSTRAINT "block_results_interval_valid" CHECK ("block_results"."to_revision" is null or "block_results"."to_revision" > "block_results"."from_revision")
);
--> statement-breakpoint
CREATE TABLE "review_requests" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"lab_id" uuid NOT NULL,
	"entry_id" uuid NOT NULL,
	"revision_number" integer NOT NULL,
	"submitted_by_id" uuid NOT NULL,
	"reviewer_id" uuid,
	"submitted_at" timestamp with time zone DEFAULT now() NOT NULL,
	"decision" text,
	"decided_by_id" uuid,
	"decided_at" timestamp with time zone,
	"comment" text DEFAULT '' NOT NULL,
	CONSTRAINT "review_requests_decision_valid" CHECK (decision is null or decision in ('countersigned','returned')),
	CONSTRAINT "review_requests_decision_consistent" CHECK (("review_requests"."decision" is null) = ("review_requests"."decided_at" is null) and ("review_requests"."decision" is null) = ("review_requests"."decided_by_id" is null))
);
--> statement-breakpoint
CREATE TABLE "solution_results" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"lab_id" uuid NOT NULL,
	"inputs_hash" text NOT NULL,
	"engine_version" text NOT NULL,
	"name" text DEFAULT '' NOT NULL,
	"temperature_c" double precision NOT NULL,
	"solvent" text NOT NULL,
	"model_requested" text NOT NULL,
	"model_used" text,
	"ionic_strength_molal" double precision,
	"ionic_strength_molar" double precision,
	"debye_length_nm" double precision,
	"species" text[] DEFAULT '{}'::text[] NOT NULL,
	"composition" jsonb DEFAULT '{}'::jsonb NOT NULL,
	"results" jsonb NOT NULL,
	"inputs" jsonb NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "solution_results_lab_inputs_unique" UNIQUE("lab_id","inputs_hash"),
	CONSTRAINT "solution_results_hash_format" CHECK ("solution_results"."inputs_hash" ~ '^[0-9a-f]{64}$'),
	CONSTRAINT "solution_results_ionic_strength_nonnegative" CHECK ("solution_results"."ionic_strength_molal" is null or "solution_results"."ionic_strength_molal" >= 0)
);
--> statement-breakpoint
CREATE TABLE "mail_outbox" (
	"id" bigserial PRIMARY KEY NOT NULL,
	"lab_id" uuid,
	"kind" text NOT NULL,
	"to_address" text NOT NULL,
	"subject" text NOT NULL,
	"body_text" text NOT NULL,
	"attempts" integer DEFAULT 0 NOT NULL,
	"last_error" text,
	"next_attempt_at" timestamp with time zone DEFAULT now() NOT NULL,
	"sent_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "mail_outbox_attempts_nonnegative" CHECK ("mail_outbox"."attempts" >= 0)
);
--> statement-breakpoint
-- Carry the solutions computed before this migration into the new tables. Every old row
-- becomes a stored result (engine version "legacy", keyed by its inputs) and a block row that
-- covers its one revision; the rows of each entry's current revision stay open.
INSERT INTO "solution_results" ("lab_id", "inputs_hash", "engine_version", "name", "temperature_c", "solvent", "model_requested", "model_used", "ionic_strength_molal", "ionic_strength_molar", "debye_length_nm", "species", "results", "inputs", "created_at")
SELECT DISTINCT ON (s."lab_id", k."hash") s."lab_id", k."hash", 'legacy', s."name", s."temperature_c", s."solvent", s."model_requested", s."model_used", s."ionic_strength_molal", s."ionic_strength_molar", s."debye_length_nm", s."species", s."results", s."inputs" - 'blockId', s."created_at"
FROM "solutions" s
CROSS JOIN LATERAL (SELECT encode(sha256(convert_to((s."inputs" - 'blockId')::text || '|legacy', 'UTF8')), 'hex') AS "hash") k
ORDER BY s."lab_id", k."hash", s."created_at";--> statement-breakpoint
INSERT INTO "block_results" ("lab_id", "entry_id", "block_id", "result_id", "from_revision", "to_revision", "position", "name", "temperature_c", "solvent", "model_used", "ionic_strength_molal", "ionic_strength_molar", "debye_length_nm", "species", "created_at")
SELECT s."lab_id", s."entry_id", s."block_id", r."id", rev."number",
  CASE WHEN rev."number" = e."current_revision_number" THEN NULL ELSE rev."number" + 1 END,
  (row_number() OVER (PARTITION BY s."revision_id" ORDER BY s."created_at", s."id")) - 1,
  s."name", s."temperature_c", s."solvent", s."model_used", s."ionic_strength_molal", s."ionic_strength_molar", s."debye_length_nm", s."species", s."created_at"
FROM "solutions" s
JOIN "revisions" rev ON rev."id" = s."revision_id"
JOIN "entries" e ON e."id" = s."entry_id"
JOIN "solution_results" r ON r."lab_id" = s."lab_id"
  AND r."inputs_hash" = encode(sha256(convert_to((s."inputs" - 'blockId')::text || '|legacy', 'UTF8')), 'hex');--> statement-breakpoint
ALTER TABLE "solution_components" DISABLE ROW LEVEL SECURITY;--> statement-breakpoint
ALTER TABLE "solutions" DISABLE ROW LEVEL SECURITY;--> statement-breakpoint
DROP TABLE "solution_components" CASCADE;--> statement-breakpoint
DROP TABLE "solutions" CASCADE;--> statement-breakpoint
ALTER TABLE "signatures" DROP CONSTRAINT "signatures_meaning_valid";--> statement-breakpoint
DROP INDEX "signatures_revision_idx";--> statement-breakpoint
ALTER TABLE "entries" ADD COLUMN "signed_revision_number" integer;--> statement-breakpoint
ALTER TABLE "entries" ADD COLUMN "amendment_reason" text;--> statement-breakpoint
ALTER TABLE "revisions" ADD COLUMN "amends_revision_number" integer;--> statement-breakpoint
ALTER TABLE "revisions" ADD COLUMN "amendment_reason" text;--> statement-breakpoint
ALTER TABLE "signatures" ADD COLUMN "lab_id" uuid NOT NULL;--> statement-breakpoint
ALTER TABLE "signatures" ADD COLUMN "entry_id" uuid NOT NULL;--> statement-breakpoint
ALTER TABLE "signatures" ADD COLUMN "revision_number" integer NOT NULL;--> statement-breakpoint
ALTER TABLE "signatures" ADD COLUMN "signer_name" text NOT NULL;--> statement-breakpoint
ALTER TABLE "block_results" ADD CONSTRAINT "block_results_lab_id_labs_id_fk" FOREIGN KEY ("lab_id") REFERENCES "public"."labs"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "block_results" ADD CONSTRAINT "block_results_entry_id_entries_id_fk" FOREIGN KEY ("entry_id") REFERENCES "public"."entries"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "block_results" ADD CONSTRAINT "block_results_result_id_solution_results_id_fk" FOREIGN KEY ("result_id") REFERENCES "public"."solution_results"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "review_requests" ADD CONSTRAINT "review_requests_lab_id_labs_id_fk" FOREIGN KEY ("lab_id") REFERENCES "public"."labs"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "review_requests" ADD CONSTRAINT "review_requests_entry_id_entries_id_fk" FOREIGN KEY ("entry_id") REFERENCES "public"."entries"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "review_requests" ADD CONSTRAINT "review_requests_submitted_by_id_users_id_fk" FOREIGN KEY ("submitted_by_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "review_requests" ADD CONSTRAINT "review_requests_reviewer_id_users_id_fk" FOREIGN KEY ("reviewer_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "review_requests" ADD CONSTRAINT "review_requests_decided_by_id_users_id_fk" FOREIGN KEY ("decided_by_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "solution_results" ADD CONSTRAINT "solution_results_lab_id_labs_id_fk" FOREIGN KEY ("lab_id") REFERENCES "public"."labs"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "mail_outbox" ADD CONSTRAINT "mail_outbox_lab_id_labs_id_fk" FOREIGN KEY ("lab_id") REFERENCES "public"."labs"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "block_results_entry_idx" ON "block_results" USING btree ("entry_id","from_revision");--> statement-breakpoint
CREATE INDEX "block_results_current_ionic_strength_idx" ON "block_results" USING btree ("lab_id","ionic_strength_molal") WHERE "block_results"."to_revision" is null;--> statement-breakpoint
CREATE INDEX "block_results_current_ionic_strength_molar_idx" ON "block_results" USING btree ("lab_id","ionic_strength_molar") WHERE "block_results"."to_revision" is null;--> statement-breakpoint
CREATE INDEX "block_results_current_species_idx" ON "block_results" USING gin ("species") WHERE "block_results"."to_revision" is null;--> statement-breakpoint
CREATE INDEX "block_results_current_created_idx" ON "block_results" USING btree ("lab_id","created_at") WHERE "block_results"."to_revision" is null;--> statement-breakpoint
CREATE INDEX "block_results_lab_ionic_strength_idx" ON "block_results" USING btree ("lab_id","ionic_strength_molal");--> statement-breakpoint
CREATE UNIQUE INDEX "review_requests_one_open_per_entry" ON "review_requests" USING btree ("entry_id") WHERE "review_requests"."decision" is null;--> statement-breakpoint
CREATE INDEX "review_requests_lab_open_idx" ON "review_requests" USING btree ("lab_id") WHERE "review_requests"."decision" is null;--> statement-breakpoint
CREATE INDEX "mail_outbox_pending_idx" ON "mail_outbox" USING btree ("next_attempt_at") WHERE "mail_outbox"."sent_at" is null;--> statement-breakpoint
CREATE INDEX "mail_outbox_lab_idx" ON "mail_outbox" USING btree ("lab_id","created_at");--> statement-breakpoint
ALTER TABLE "signatures" ADD CONSTRAINT "signatures_lab_id_labs_id_fk" FOREIGN KEY ("lab_id") REFERENCES "public"."labs"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "signatures" ADD CONSTRAINT "signatures_entry_id_entries_id_fk" FOREIGN KEY ("entry_id") REFERENCES "public"."entries"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "signatures_entry_idx" ON "signatures" USING btree ("entry_id");--> statement-breakpoint
ALTER TABLE "signatures" ADD CONSTRAINT "signatures_revision_unique" UNIQUE("revision_id");--> statement-breakpoint
ALTER TABLE "revisions" ADD CONSTRAINT "revisions_amendment_consistent" CHECK (("revisions"."amends_revision_number" is null) = ("revisions"."amendment_reason" is null));--> statement-breakpoint
ALTER TABLE "signatures" ADD CONSTRAINT "signatures_hash_format" CHECK ("signatures"."content_hash" ~ '^[0-9a-f]{64}$');--> statement-breakpoint
ALTER TABLE "signatures" ADD CONSTRAINT "signatures_meaning_valid" CHECK (meaning in ('witnessed','approved','reviewed'));