// @vitest-environment node
import { Client } from "pg";
import { afterAll, describe, expect, it } from "vitest";
import { cpSync, mkdirSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { MIGRATIONS_FOLDER, runMigrations } from "@/scripts/migrate";

// Runs the committed migrations on a brand-new, empty database and checks what they made.
const superuserUrl = process.env.TEST_SUPERUSER_URL;
const dbName = `ionleaf_migrate_${process.pid}`;

async function withClient<T>(url: string, fn: (c: Client) => Promise<T>): Promise<T> {
  const client = new Client({ connectionString: url });
  await client.connect();
  try {
    return await fn(client);
  } finally {
    await client.end();
  }
}

/**
 * Writes into `folder` the committed migrations that come before `tag` (journal and SQL), as a
 * database made before that migration had them; returns their tags.
 */
function migrationsBefore(tag: string, folder: string): string[] {
  const journal = JSON.parse(
    readFileSync(join(MIGRATIONS_FOLDER, "meta/_journal.json"), "utf8"),
  ) as { entries: { tag: string }[] };
  const upTo = journal.entries.findIndex((e) => e.tag === tag);
  expect(upTo).toBeGreaterThan(0);
  const before = journal.entries.slice(0, upTo);
  mkdirSync(join(folder, "meta"));
  writeFileSync(
    join(folder, "meta/_journal.json"),
    JSON.stringify({ ...journal, entries: before }),
  );
  for (const e of before)
    cpSync(join(MIGRATIONS_FOLDER, `${e.tag}.sql`), join(folder, `${e.tag}.sql`));
  return before.map((e) => e.tag);
}

describe("migrations on an empty database", () => {
  if (!superuserUrl)
    throw new Error("TEST_SUPERUSER_URL is not set: run the tests through npm test");
  const targetUrl = superuserUrl.replace(/\/[^/]+$/, `/${dbName}`);

  afterAll(async () => {
    await withClient(superuserUrl, (c) => c.query(`drop database if exists ${dbName}`));
  });

  it("creates every table, the immutability triggers, and is idempotent", async () => {
    await withClient(superuserUrl, (c) => c.query(`create database ${dbName}`));
    await runMigrations(targetUrl);
    await runMigrations(targetUrl); // a second start applies nothing and fails nothing
    const tables = await withClient(targetUrl, (c) =>
      c.query<{ tablename: string }>(
        "select tablename from pg_tables where schemaname='public' order by 1",
      ),
    );
    expect(tables.rows.map((r) => r.tablename)).toEqual([
      "attachments",
      "audit_events",
      "block_results",
      "block_species",
      "entries",
      "invitations",
      "labs",
      "mail_outbox",
      "projects",
      "review_requests",
      "revisions",
      "sign_in_attempts",
      "signatures",
      "solution_parents",
      "solution_results",
      "species",
      "trace_mappings",
      "users",
    ]);
    const triggers = await withClient(targetUrl, (c) =>
      c.query<{ tgname: string }>(
        "select tgname from pg_trigger where not tgisinternal order by 1",
      ),
    );
    expect(triggers.rows.map((r) => r.tgname)).toEqual([
      "attachments_immutable",
      "audit_events_append_only",
      "block_results_guard",
      "block_results_species_close",
      "block_results_species_open",
      "entries_guard",
      "entries_no_delete",
      "revisions_immutable",
      "signatures_immutable",
      "solution_parents_immutable",
      "solution_parents_same_lab",
      "solution_results_immutable",
    ]);
  });

  it("enforces the role check constraint", async () => {
    const error = await withClient(targetUrl, async (c) => {
      const lab = await c.query<{ id: string }>(
        "insert into labs (name, slug) values ('Check lab', 'check-lab') returning id",
      );
      return c
        .query(
          "insert into users (lab_id, email, name, password_hash, role) values ($1, 'x@y.example', 'X', 'h', 'owner')",
          [lab.rows[0].id],
        )
        .then(
          () => null,
          (e: Error) => e,
        );
    });
    expect(error?.message).toMatch(/users_role_valid/);
  });
});

describe("migration 0003 carries solutions saved before it into the new tables", () => {
  const superuser = process.env.TEST_SUPERUSER_URL!;
  const legacyDb = `ionleaf_legacy_${process.pid}`;
  const legacyUrl = superuser.replace(/\/[^/]+$/, `/${legacyDb}`);
  const partial = mkdtempSync(join(tmpdir(), "ionleaf-migrations-"));

  afterAll(async () => {
    await withClient(superuser, (c) => c.query(`drop database if exists ${legacyDb}`));
    rmSync(partial, { recursive: true, force: true });
  });

  it("keeps every revision's numbers and leaves the current revision's blocks open", async () => {
    // The migrations up to 0002, as a database saved before 0003 had them.
    expect(migrationsBefore("0003_countersign_and_block_results", partial)).toEqual([
      "0000_init",
      "0001_immutable_revisions",
      "0002_entry_status_amended",
    ]);

    await withClient(superuser, (c) => c.query(`create database ${legacyDb}`));
    await runMigrations(legacyUrl, partial);
    await withClient(legacyUrl, async (c) => {
      const lab = (
        await c.query<{ id: string }>(
          "insert into labs (name, slug) values ('L', 'l') returning id",
        )
      ).rows[0].id;
      const user = (
        await c.query<{ id: string }>(
          "insert into users (lab_id, email, name, password_hash, role) values ($1, 'a@b.example', 'A', 'h', 'researcher') returning id",
          [lab],
        )
      ).rows[0].id;
      const project = (
        await c.query<{ id: string }>(
          "insert into projects (lab_id, name, created_by_id) values ($1, 'P', $2) returning id",
          [lab, user],
        )
      ).rows[0].id;
      const entry = (
        await c.query<{ id: string }>(
          "insert into entries (lab_id, project_id, title, author_id, current_revision_number) values ($1, $2, 'E', $3, 2) returning id",
          [lab, project, user],
        )
      ).rows[0].id;
      for (const [number, molality] of [
        [1, 0.1],
        [2, 0.2],
      ] as const) {
        const revision = (
          await c.query<{ id: string }>(
            "insert into revisions (entry_id, number, title, content, content_hash, author_id) values ($1, $2, 'E', '{}', $3, $4) returning id",
            [entry, number, "a".repeat(64), user],
          )
        ).rows[0].id;
        await c.query(
          `insert into solutions (lab_id, entry_id, revision_id, block_id, name, temperature_c, solvent, model_requested, model_used, ionic_strength_molal, species, results, inputs)
           values ($1, $2, $3, 'blk-1', 'S', 25, 'water', 'auto', 'pitzer', $4, '{NaCl}', '{"status":"ok"}', $5)`,
          [lab, entry, revision, molality, JSON.stringify({ blockId: "blk-1", molality })],
        );
      }
    });
    await runMigrations(legacyUrl);
    const rows = await withClient(legacyUrl, (c) =>
      c.query<{
        from_revision: number;
        to_revision: number | null;
        ionic_strength_molal: number;
        engine_version: string;
      }>(
        `select b.from_revision, b.to_revision, r.ionic_strength_molal, r.engine_version
           from block_results b join solution_results r on r.id = b.result_id order by b.from_revision`,
      ),
    );
    expect(rows.rows).toEqual([
      { from_revision: 1, to_revision: 2, ionic_strength_molal: 0.1, engine_version: "legacy" },
      { from_revision: 2, to_revision: null, ionic_strength_molal: 0.2, engine_version: "legacy" },
    ]);
  });
});

describe("migration 0011 gives every stored solution its one-line recipe", () => {
  const superuser = process.env.TEST_SUPERUSER_URL!;
  const olderDb = `ionleaf_summary_${process.pid}`;
  const olderUrl = superuser.replace(/\/[^/]+$/, `/${olderDb}`);
  const partial = mkdtempSync(join(tmpdir(), "ionleaf-migrations-"));

  afterAll(async () => {
    await withClient(superuser, (c) => c.query(`drop database if exists ${olderDb}`));
    rmSync(partial, { recursive: true, force: true });
  });

  it("fills the summaries of rows saved before it, stocks included, and keeps them immutable", async () => {
    migrationsBefore("0011_composition_summary", partial);

    await withClient(superuser, (c) => c.query(`create database ${olderDb}`));
    await runMigrations(olderUrl, partial);
    const rows: [string, unknown, unknown][] = [
      // Typed rows, a weighed amount with its basis, and a row still being typed.
      [
        "a".repeat(64),
        [
          { formula: "KCl", amount: 0.1, unit: "mol/kg" },
          { formula: "K3Fe(CN)6", amount: 0.005, unit: "mmol/L" },
          { formula: "NaCl", amount: 2.92, unit: "g", perAmount: 100, perUnit: "mL" },
          { formula: "", amount: null, unit: "mol/kg" },
        ],
        { status: "ok" },
      ],
      // Made from a stock: its share comes from the stored dilution arithmetic.
      [
        "b".repeat(64),
        [],
        {
          status: "ok",
          dilution: { components: [{ formula: "CuSO4", amount: 0.01, unit: "mol/L" }] },
        },
      ],
    ];
    await withClient(olderUrl, async (c) => {
      const lab = (
        await c.query<{ id: string }>(
          "insert into labs (name, slug) values ('L', 'l') returning id",
        )
      ).rows[0].id;
      for (const [hash, components, results] of rows)
        await c.query(
          `insert into solution_results (lab_id, inputs_hash, engine_version, name, temperature_c, solvent, model_requested, results, inputs)
           values ($1, $2, 'test', 'S', 25, 'water', 'auto', $3, $4)`,
          [lab, hash, JSON.stringify(results), JSON.stringify({ components })],
        );
    });

    await runMigrations(olderUrl);
    await runMigrations(olderUrl); // nothing left to fill: a quiet second start
    await withClient(olderUrl, async (c) => {
      const summaries = await c.query<{ inputs_hash: string; composition_summary: string }>(
        "select inputs_hash, composition_summary from solution_results order by inputs_hash",
      );
      expect(summaries.rows.map((r) => r.composition_summary)).toEqual([
        "0.1 mol/kg KCl + 0.005 mmol/L K₃Fe(CN)₆ + 2.92 g per 100 mL NaCl",
        "0.01 mol/L CuSO₄",
      ]);
      // The stored results are as immutable as before the backfill.
      await expect(
        c.query("update solution_results set composition_summary = 'changed'"),
      ).rejects.toThrow(/immutable|refuse|cannot/i);
    });
  });
});
