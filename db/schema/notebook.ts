import { sql } from "drizzle-orm";
import {
  bigint,
  check,
  doublePrecision,
  index,
  integer,
  jsonb,
  pgTable,
  text,
  timestamp,
  unique,
  uuid,
} from "drizzle-orm/pg-core";
import { ENTRY_STATUSES, type EntryStatus, SIGNATURE_MEANINGS, sqlList } from "./enums";
import { labs, users } from "./labs";

const createdAt = () => timestamp("created_at", { withTimezone: true }).notNull().defaultNow();

export const projects = pgTable(
  "projects",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    labId: uuid("lab_id")
      .notNull()
      .references(() => labs.id, { onDelete: "restrict" }),
    name: text("name").notNull(),
    description: text("description").notNull().default(""),
    createdById: uuid("created_by_id")
      .notNull()
      .references(() => users.id),
    archivedAt: timestamp("archived_at", { withTimezone: true }),
    createdAt: createdAt(),
  },
  (t) => [
    unique("projects_lab_name_unique").on(t.labId, t.name),
    check("projects_name_not_blank", sql`length(trim(${t.name})) > 0`),
  ],
);

export const entries = pgTable(
  "entries",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    labId: uuid("lab_id")
      .notNull()
      .references(() => labs.id, { onDelete: "restrict" }),
    projectId: uuid("project_id")
      .notNull()
      .references(() => projects.id, { onDelete: "restrict" }),
    title: text("title").notNull(),
    status: text("status").$type<EntryStatus>().notNull().default("draft"),
    authorId: uuid("author_id")
      .notNull()
      .references(() => users.id),
    /** Number of the newest revision; 0 before the first save. */
    currentRevisionNumber: integer("current_revision_number").notNull().default(0),
    template: text("template"),
    archivedAt: timestamp("archived_at", { withTimezone: true }),
    createdAt: createdAt(),
    updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    index("entries_lab_updated_idx").on(t.labId, t.updatedAt),
    index("entries_project_idx").on(t.projectId),
    index("entries_author_idx").on(t.authorId),
    index("entries_title_fts_idx").using("gin", sql`to_tsvector('simple', ${t.title})`),
    check("entries_status_valid", sql.raw(`status in ${sqlList(ENTRY_STATUSES)}`)),
    check("entries_title_not_blank", sql`length(trim(${t.title})) > 0`),
    check("entries_revision_number_nonnegative", sql`${t.currentRevisionNumber} >= 0`),
  ],
);

/** Immutable: a trigger (migration 0001) refuses UPDATE and DELETE. */
export const revisions = pgTable(
  "revisions",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    entryId: uuid("entry_id")
      .notNull()
      .references(() => entries.id, { onDelete: "restrict" }),
    number: integer("number").notNull(),
    title: text("title").notNull(),
    content: jsonb("content").$type<Record<string, unknown>>().notNull(),
    /** Plain text of the document, for full-text search. */
    contentText: text("content_text").notNull().default(""),
    /** Hex SHA-256 of the canonical JSON of `content`. */
    contentHash: text("content_hash").notNull(),
    authorId: uuid("author_id")
      .notNull()
      .references(() => users.id),
    createdAt: createdAt(),
  },
  (t) => [
    unique("revisions_entry_number_unique").on(t.entryId, t.number),
    index("revisions_text_fts_idx").using("gin", sql`to_tsvector('simple', ${t.contentText})`),
    check("revisions_number_positive", sql`${t.number} >= 1`),
    check("revisions_hash_format", sql`${t.contentHash} ~ '^[0-9a-f]{64}$'`),
  ],
);

/** One row per solution block per revision, recomputed on the server. */
export const solutions = pgTable(
  "solutions",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    labId: uuid("lab_id")
      .notNull()
      .references(() => labs.id, { onDelete: "restrict" }),
    entryId: uuid("entry_id")
      .notNull()
      .references(() => entries.id, { onDelete: "restrict" }),
    revisionId: uuid("revision_id")
      .notNull()
      .references(() => revisions.id, { onDelete: "restrict" }),
    blockId: text("block_id").notNull(),
    name: text("name").notNull().default(""),
    temperatureC: doublePrecision("temperature_c").notNull(),
    solvent: text("solvent").notNull(),
    modelRequested: text("model_requested").notNull(),
    modelUsed: text("model_used"),
    ionicStrengthMolal: doublePrecision("ionic_strength_molal"),
    ionicStrengthMolar: doublePrecision("ionic_strength_molar"),
    debyeLengthNm: doublePrecision("debye_length_nm"),
    /** Species formulas (salts and ions) for the solution finder (GIN). */
    species: text("species")
      .array()
      .notNull()
      .default(sql`'{}'::text[]`),
    /** The engine's full result, or its error when the inputs were impossible. */
    results: jsonb("results").$type<Record<string, unknown>>().notNull(),
    inputs: jsonb("inputs").$type<Record<string, unknown>>().notNull(),
    createdAt: createdAt(),
  },
  (t) => [
    unique("solutions_revision_block_unique").on(t.revisionId, t.blockId),
    index("solutions_ionic_strength_idx").on(t.ionicStrengthMolal),
    index("solutions_species_idx").using("gin", t.species),
    index("solutions_temperature_idx").on(t.temperatureC),
    index("solutions_lab_created_idx").on(t.labId, t.createdAt),
    check(
      "solutions_ionic_strength_nonnegative",
      sql`${t.ionicStrengthMolal} is null or ${t.ionicStrengthMolal} >= 0`,
    ),
  ],
);

export const solutionComponents = pgTable(
  "solution_components",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    solutionId: uuid("solution_id")
      .notNull()
      .references(() => solutions.id, { onDelete: "cascade" }),
    position: integer("position").notNull(),
    formula: text("formula").notNull(),
    amount: doublePrecision("amount").notNull(),
    unit: text("unit").notNull(),
    perAmount: doublePrecision("per_amount"),
    perUnit: text("per_unit"),
    molality: doublePrecision("molality"),
    molarity: doublePrecision("molarity"),
  },
  (t) => [
    unique("solution_components_position_unique").on(t.solutionId, t.position),
    index("solution_components_formula_idx").on(t.formula),
  ],
);

export const signatures = pgTable(
  "signatures",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    revisionId: uuid("revision_id")
      .notNull()
      .references(() => revisions.id, { onDelete: "restrict" }),
    signerId: uuid("signer_id")
      .notNull()
      .references(() => users.id),
    meaning: text("meaning").notNull(),
    contentHash: text("content_hash").notNull(),
    comment: text("comment").notNull().default(""),
    signedAt: timestamp("signed_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    index("signatures_revision_idx").on(t.revisionId),
    check("signatures_meaning_valid", sql.raw(`meaning in ${sqlList(SIGNATURE_MEANINGS)}`)),
  ],
);

export const attachments = pgTable(
  "attachments",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    labId: uuid("lab_id")
      .notNull()
      .references(() => labs.id, { onDelete: "restrict" }),
    entryId: uuid("entry_id")
      .notNull()
      .references(() => entries.id, { onDelete: "restrict" }),
    sha256: text("sha256").notNull(),
    sizeBytes: bigint("size_bytes", { mode: "number" }).notNull(),
    detectedType: text("detected_type").notNull(),
    originalName: text("original_name").notNull(),
    storedPath: text("stored_path").notNull(),
    uploaderId: uuid("uploader_id")
      .notNull()
      .references(() => users.id),
    parsedSummary: jsonb("parsed_summary").$type<Record<string, unknown>>(),
    createdAt: createdAt(),
  },
  (t) => [
    index("attachments_entry_idx").on(t.entryId),
    check("attachments_size_nonnegative", sql`${t.sizeBytes} >= 0`),
    check("attachments_sha256_format", sql`${t.sha256} ~ '^[0-9a-f]{64}$'`),
  ],
);

/** A lab's own additions to the built-in species catalogue. */
export const species = pgTable(
  "species",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    labId: uuid("lab_id")
      .notNull()
      .references(() => labs.id, { onDelete: "cascade" }),
    formula: text("formula").notNull(),
    name: text("name").notNull(),
    /** Dissociation: [{ ion: "Na+", count: 1 }, …]; empty for a bare ion. */
    ions: jsonb("ions").$type<{ ion: string; count: number }[]>().notNull().default([]),
    createdById: uuid("created_by_id")
      .notNull()
      .references(() => users.id),
    createdAt: createdAt(),
  },
  (t) => [unique("species_lab_formula_unique").on(t.labId, t.formula)],
);

export type Project = typeof projects.$inferSelect;
export type Entry = typeof entries.$inferSelect;
export type Revision = typeof revisions.$inferSelect;
export type Solution = typeof solutions.$inferSelect;
export type SolutionComponent = typeof solutionComponents.$inferSelect;
export type Signature = typeof signatures.$inferSelect;
export type Attachment = typeof attachments.$inferSelect;
export type SpeciesAddition = typeof species.$inferSelect;
