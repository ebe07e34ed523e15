import { sql } from "drizzle-orm";
import {
  bigint,
  check,
  doublePrecision,
  index,
  integer,
  jsonb,
  pgTable,
  primaryKey,
  text,
  timestamp,
  unique,
  uniqueIndex,
  uuid,
} from "drizzle-orm/pg-core";
import {
  ENTRY_STATUSES,
  type EntryStatus,
  REVIEW_DECISIONS,
  type ReviewDecision,
  SIGNATURE_MEANINGS,
  type SignatureMeaning,
  ATTACHMENT_KINDS,
  type AttachmentKind,
  sqlList,
} from "./enums";
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
    /** The newest countersigned revision; null until the first countersignature. */
    signedRevisionNumber: integer("signed_revision_number"),
    /** The reason of the amendment in progress (status "amended" or its submission). */
    amendmentReason: text("amendment_reason"),
    archivedAt: timestamp("archived_at", { withTimezone: true }),
    createdAt: createdAt(),
    updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    index("entries_lab_updated_idx").on(t.labId, t.updatedAt),
    index("entries_project_idx").on(t.projectId),
    index("entries_author_idx").on(t.authorId),
    // The solution finder: its status filter, and archived entries (few) left out of every
    // search by an anti-join over this small index.
    index("entries_lab_status_idx").on(t.labId, t.status),
    index("entries_archived_idx")
      .on(t.id)
      .where(sql`${t.archivedAt} is not null`),
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
    /** An amendment: the countersigned revision it changes, and why. */
    amendsRevisionNumber: integer("amends_revision_number"),
    amendmentReason: text("amendment_reason"),
    createdAt: createdAt(),
  },
  (t) => [
    unique("revisions_entry_number_unique").on(t.entryId, t.number),
    check(
      "revisions_amendment_consistent",
      sql`(${t.amendsRevisionNumber} is null) = (${t.amendmentReason} is null)`,
    ),
    // Full-text search of title and text with English stemming; the solution finder writes
    // the same expression (db/queries/solution-finder-text.ts) so the planner can use it.
    index("revisions_search_idx").using(
      "gin",
      sql`to_tsvector('english', ${t.title} || ' ' || ${t.contentText})`,
    ),
    check("revisions_number_positive", sql`${t.number} >= 1`),
    check("revisions_hash_format", sql`${t.contentHash} ~ '^[0-9a-f]{64}$'`),
  ],
);

/**
 * The server's computation of one solution block's inputs, stored once per distinct content
 * and engine version: a block that did not change between two saves points at the same row.
 * Immutable (a trigger refuses UPDATE and DELETE), so a revision shows forever the numbers
 * that were computed when it was saved.
 */
export const solutionResults = pgTable(
  "solution_results",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    labId: uuid("lab_id")
      .notNull()
      .references(() => labs.id, { onDelete: "restrict" }),
    /** SHA-256 of the canonical { inputs without the block id, engine version }. */
    inputsHash: text("inputs_hash").notNull(),
    /** lib/chem's ENGINE_VERSION when this row was computed. */
    engineVersion: text("engine_version").notNull(),
    name: text("name").notNull().default(""),
    temperatureC: doublePrecision("temperature_c").notNull(),
    solvent: text("solvent").notNull(),
    modelRequested: text("model_requested").notNull(),
    modelUsed: text("model_used"),
    ionicStrengthMolal: doublePrecision("ionic_strength_molal"),
    ionicStrengthMolar: doublePrecision("ionic_strength_molar"),
    debyeLengthNm: doublePrecision("debye_length_nm"),
    /** Species formulas (components, ions, salts) for the solution finder. */
    species: text("species")
      .array()
      .notNull()
      .default(sql`'{}'::text[]`),
    /** Molality (mol/kg) of every ion, for the composition distance of "similar solutions". */
    composition: jsonb("composition").$type<Record<string, number>>().notNull().default({}),
    /** The engine's full result, or its error when the inputs were impossible. */
    results: jsonb("results").$type<Record<string, unknown>>().notNull(),
    inputs: jsonb("inputs").$type<Record<string, unknown>>().notNull(),
    /**
     * The recipe in one line with formulas typeset ("0.1 mol/kg KCl + 5 mmol/L K₃Fe(CN)₆"),
     * including what stocks contribute, written with the row so that the finder shows it
     * without reading the inputs. Null only for rows saved before it existed, until
     * scripts/support/backfill-composition-summaries.ts (run after the migrations) fills them.
     */
    compositionSummary: text("composition_summary"),
    createdAt: createdAt(),
  },
  (t) => [
    unique("solution_results_lab_inputs_unique").on(t.labId, t.inputsHash),
    // The rows the backfill still has to fill: empty once it has run, so finding that there
    // is nothing to do costs nothing at start-up however large the table.
    index("solution_results_summary_pending_idx")
      .on(t.id)
      .where(sql`${t.compositionSummary} is null`),
    check("solution_results_hash_format", sql`${t.inputsHash} ~ '^[0-9a-f]{64}$'`),
    check(
      "solution_results_ionic_strength_nonnegative",
      sql`${t.ionicStrengthMolal} is null or ${t.ionicStrengthMolal} >= 0`,
    ),
  ],
);

/**
 * Which result a solution block of an entry showed, from one revision up to (not including)
 * another: `[fromRevision, toRevision)`, open-ended while the block is current. A save writes
 * a row only for a block that is new or changed, and closes the row of a block that changed
 * or left the document; an unchanged block costs nothing. The rows with `to_revision IS NULL`
 * are the entry's current solutions, which the solution finder searches (partial indexes).
 * Finder fields are copied from the result so that search never joins through history.
 * A trigger refuses DELETE and every UPDATE except closing an open row once.
 */
export const blockResults = pgTable(
  "block_results",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    labId: uuid("lab_id")
      .notNull()
      .references(() => labs.id, { onDelete: "restrict" }),
    entryId: uuid("entry_id")
      .notNull()
      .references(() => entries.id, { onDelete: "restrict" }),
    blockId: text("block_id").notNull(),
    resultId: uuid("result_id")
      .notNull()
      .references(() => solutionResults.id, { onDelete: "restrict" }),
    fromRevision: integer("from_revision").notNull(),
    toRevision: integer("to_revision"),
    /** Position of the block among the entry's solution blocks when this row was written. */
    position: integer("position").notNull(),
    name: text("name").notNull().default(""),
    temperatureC: doublePrecision("temperature_c").notNull(),
    solvent: text("solvent").notNull(),
    modelUsed: text("model_used"),
    ionicStrengthMolal: doublePrecision("ionic_strength_molal"),
    ionicStrengthMolar: doublePrecision("ionic_strength_molar"),
    debyeLengthNm: doublePrecision("debye_length_nm"),
    species: text("species")
      .array()
      .notNull()
      .default(sql`'{}'::text[]`),
    createdAt: createdAt(),
  },
  (t) => [
    unique("block_results_entry_block_from_unique").on(t.entryId, t.blockId, t.fromRevision),
    index("block_results_entry_idx").on(t.entryId, t.fromRevision),
    // The finder's range scans on either ionic-strength scale use two covering partial
    // indexes, block_results_current_molal_idx and block_results_current_molar_idx:
    // (lab_id, ionic_strength_molal|molar) INCLUDE (species, entry_id, created_at, id)
    // WHERE to_revision IS NULL. They are written in SQL in drizzle/0007_finder_search.sql
    // because Drizzle cannot declare INCLUDE; a range + species query is answered from the
    // index alone (docs/architecture.md, "The solution finder").
    index("block_results_current_species_idx")
      .using("gin", t.species)
      .where(sql`${t.toRevision} is null`),
    // An entry's current solutions: the save's open rows, and the finder's text search.
    index("block_results_current_entry_idx")
      .on(t.entryId)
      .where(sql`${t.toRevision} is null`),
    index("block_results_current_created_idx")
      .on(t.labId, t.createdAt)
      .where(sql`${t.toRevision} is null`),
    // Closed rows (earlier revisions), searched only when the finder includes history; kept
    // apart so that a search of current solutions never wanders into them.
    index("block_results_closed_ionic_strength_idx")
      .on(t.labId, t.ionicStrengthMolal)
      .where(sql`${t.toRevision} is not null`),
    index("block_results_closed_ionic_strength_molar_idx")
      .on(t.labId, t.ionicStrengthMolar)
      .where(sql`${t.toRevision} is not null`),
    index("block_results_closed_species_idx")
      .using("gin", t.species)
      .where(sql`${t.toRevision} is not null`),
    index("block_results_closed_created_idx")
      .on(t.labId, t.createdAt)
      .where(sql`${t.toRevision} is not null`),
    check("block_results_from_positive", sql`${t.fromRevision} >= 1`),
    check(
      "block_results_interval_valid",
      sql`${t.toRevision} is null or ${t.toRevision} > ${t.fromRevision}`,
    ),
  ],
);

/**
 * The solution finder's species index: one row per species of each open block row
 * (`block_results.to_revision IS NULL`), with what a range + species search filters and
 * returns, so that such a search reads exactly the rows of that species in the
 * ionic-strength window instead of every row of the window (a GIN index on the array cannot
 * do ranges or cover). Derived, never written by the application: triggers on
 * block_results add a row's species when it is inserted open and remove them when it is
 * closed (drizzle/0010_finder_species.sql), and the application role may only read it.
 * The covering indexes (lab, species, I) INCLUDE (created_at, entry_id, block_result_id)
 * on either scale are written in that migration too, because Drizzle cannot declare
 * INCLUDE: block_species_molal_idx and block_species_molar_idx.
 */
export const blockSpecies = pgTable(
  "block_species",
  {
    blockResultId: uuid("block_result_id")
      .notNull()
      .references(() => blockResults.id, { onDelete: "restrict" }),
    labId: uuid("lab_id").notNull(),
    species: text("species").notNull(),
    ionicStrengthMolal: doublePrecision("ionic_strength_molal"),
    ionicStrengthMolar: doublePrecision("ionic_strength_molar"),
    entryId: uuid("entry_id").notNull(),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull(),
  },
  (t) => [primaryKey({ name: "block_species_pkey", columns: [t.blockResultId, t.species] })],
);

/**
 * Lineage: a solution block made from other solution blocks (stocks). One row per stock of a
 * block row: which solution block (entry, block, revision) was used, which stored result that
 * revision showed, and how much of it went into how much final volume. Written with the child's
 * block row (a change of stocks is a change of the block's inputs, so a new block row), never
 * changed or deleted afterwards (a trigger refuses it), so the links of a countersigned revision
 * stay as they were signed. The parent is in the same lab (a trigger checks it too).
 */
export const solutionParents = pgTable(
  "solution_parents",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    labId: uuid("lab_id")
      .notNull()
      .references(() => labs.id, { onDelete: "restrict" }),
    /** The child's block row: its entry, block and the revisions it covers. */
    blockResultId: uuid("block_result_id")
      .notNull()
      .references(() => blockResults.id, { onDelete: "restrict" }),
    entryId: uuid("entry_id")
      .notNull()
      .references(() => entries.id, { onDelete: "restrict" }),
    blockId: text("block_id").notNull(),
    /** The child revision that first recorded this link (the block row's from_revision). */
    revision: integer("revision").notNull(),
    /** Position of the stock in the block's list. */
    position: integer("position").notNull(),
    parentEntryId: uuid("parent_entry_id")
      .notNull()
      .references(() => entries.id, { onDelete: "restrict" }),
    parentBlockId: text("parent_block_id").notNull(),
    parentRevision: integer("parent_revision").notNull(),
    /** The stored result the parent block showed at that revision: the composition used. */
    parentResultId: uuid("parent_result_id")
      .notNull()
      .references(() => solutionResults.id, { onDelete: "restrict" }),
    volumeMl: doublePrecision("volume_ml").notNull(),
    finalVolumeMl: doublePrecision("final_volume_ml").notNull(),
    createdAt: createdAt(),
  },
  (t) => [
    unique("solution_parents_block_row_position_unique").on(t.blockResultId, t.position),
    // The stock list: every use of a lab's stock blocks.
    index("solution_parents_lab_parent_idx").on(t.labId, t.parentEntryId, t.parentBlockId),
    // An entry's stocks, for the notice of a newer stock revision.
    index("solution_parents_entry_idx").on(t.entryId),
    check(
      "solution_parents_revisions_positive",
      sql`${t.revision} >= 1 and ${t.parentRevision} >= 1`,
    ),
    check(
      "solution_parents_volumes_valid",
      sql`${t.volumeMl} > 0 and ${t.finalVolumeMl} >= ${t.volumeMl}`,
    ),
  ],
);

/**
 * A countersignature: an electronic signature of one revision by a supervisor who re-entered
 * their password. It records the SHA-256 of the revision's signed content (title, document
 * and the hashes of its attachments), so the record can be verified later. Immutable; one
 * countersignature per revision (the unique constraint makes concurrent signing safe).
 */
export const signatures = pgTable(
  "signatures",
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
    revisionNumber: integer("revision_number").notNull(),
    signerId: uuid("signer_id")
      .notNull()
      .references(() => users.id),
    /** The signer's name as it was when they signed (the manifest never changes). */
    signerName: text("signer_name").notNull(),
    meaning: text("meaning").$type<SignatureMeaning>().notNull(),
    contentHash: text("content_hash").notNull(),
    comment: text("comment").notNull().default(""),
    /** Server clock, UTC. */
    signedAt: timestamp("signed_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    unique("signatures_revision_unique").on(t.revisionId),
    index("signatures_entry_idx").on(t.entryId),
    check("signatures_meaning_valid", sql.raw(`meaning in ${sqlList(SIGNATURE_MEANINGS)}`)),
    check("signatures_hash_format", sql`${t.contentHash} ~ '^[0-9a-f]{64}$'`),
  ],
);

/**
 * One request for review: opened when the author submits a revision, closed when a
 * supervisor countersigns or returns it. At most one is open per entry.
 */
export const reviewRequests = pgTable(
  "review_requests",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    labId: uuid("lab_id")
      .notNull()
      .references(() => labs.id, { onDelete: "restrict" }),
    entryId: uuid("entry_id")
      .notNull()
      .references(() => entries.id, { onDelete: "restrict" }),
    revisionNumber: integer("revision_number").notNull(),
    submittedById: uuid("submitted_by_id")
      .notNull()
      .references(() => users.id),
    /** The supervisor asked to review; null: any supervisor of the lab. */
    reviewerId: uuid("reviewer_id").references(() => users.id),
    submittedAt: timestamp("submitted_at", { withTimezone: true }).notNull().defaultNow(),
    decision: text("decision").$type<ReviewDecision>(),
    decidedById: uuid("decided_by_id").references(() => users.id),
    decidedAt: timestamp("decided_at", { withTimezone: true }),
    /** The return comment (required) or the countersignature's comment. */
    comment: text("comment").notNull().default(""),
  },
  (t) => [
    uniqueIndex("review_requests_one_open_per_entry")
      .on(t.entryId)
      .where(sql`${t.decision} is null`),
    index("review_requests_lab_open_idx")
      .on(t.labId)
      .where(sql`${t.decision} is null`),
    check(
      "review_requests_decision_valid",
      sql.raw(`decision is null or decision in ${sqlList(REVIEW_DECISIONS)}`),
    ),
    check(
      "review_requests_decision_consistent",
      sql`(${t.decision} is null) = (${t.decidedAt} is null) and (${t.decision} is null) = (${t.decidedById} is null)`,
    ),
  ],
);

/**
 * A file attached to an entry: the original kept byte for byte under its SHA-256 in the
 * storage (lib/storage), described here. Which revisions include it is decided by the
 * document: a revision's attachments are those its nodes reference (a photo figure, a trace
 * block, a file link), so removing a file from a draft is a new revision and a countersigned
 * revision keeps its files forever. Rows never change (a trigger refuses UPDATE and DELETE).
 */
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
    /** From the file's bytes (magic numbers), never from the client's claim. */
    detectedType: text("detected_type").notNull(),
    kind: text("kind").$type<AttachmentKind>().notNull().default("file"),
    originalName: text("original_name").notNull(),
    /** The storage key of the original (content-addressed). */
    storedPath: text("stored_path").notNull(),
    /** Photos: storage keys and sizes of the WebP thumbnail and web copy. */
    derivatives: jsonb("derivatives").$type<Record<string, unknown>>().notNull().default({}),
    uploaderId: uuid("uploader_id")
      .notNull()
      .references(() => users.id),
    /** Instrument exports: what the parser understood (technique, columns, ranges, problems). */
    parsedSummary: jsonb("parsed_summary").$type<Record<string, unknown>>(),
    createdAt: createdAt(),
  },
  (t) => [
    index("attachments_entry_idx").on(t.entryId),
    uniqueIndex("attachments_entry_sha256_unique").on(t.entryId, t.sha256),
    check("attachments_size_positive", sql`${t.sizeBytes} > 0`),
    check("attachments_sha256_format", sql`${t.sha256} ~ '^[0-9a-f]{64}$'`),
    check("attachments_kind_valid", sql.raw(`kind in ${sqlList(ATTACHMENT_KINDS)}`)),
  ],
);

/**
 * How a lab reads an instrument export layout the parser could not understand on its own,
 * keyed by the layout's column names: chosen once in the mapping dialog, reused for every
 * later file with the same columns.
 */
export const traceMappings = pgTable(
  "trace_mappings",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    labId: uuid("lab_id")
      .notNull()
      .references(() => labs.id, { onDelete: "cascade" }),
    /** SHA-256 of the normalised column names of the layout. */
    layoutKey: text("layout_key").notNull(),
    columns: text("columns").array().notNull(),
    mapping: jsonb("mapping").$type<Record<string, unknown>>().notNull(),
    createdById: uuid("created_by_id")
      .notNull()
      .references(() => users.id),
    updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [unique("trace_mappings_lab_layout_unique").on(t.labId, t.layoutKey)],
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
export type SolutionResultRow = typeof solutionResults.$inferSelect;
export type BlockResult = typeof blockResults.$inferSelect;
export type SolutionParent = typeof solutionParents.$inferSelect;
export type ReviewRequest = typeof reviewRequests.$inferSelect;
export type Signature = typeof signatures.$inferSelect;
export type Attachment = typeof attachments.$inferSelect;
export type SpeciesAddition = typeof species.$inferSelect;
