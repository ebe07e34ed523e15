// @vitest-environment node
import { sql } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { getDb } from "@/lib/server/database";

/**
 * The role the app serves as (DATABASE_URL) owns nothing: it cannot change the schema,
 * switch off or drop a guard trigger, or address kept records with UPDATE, DELETE or
 * TRUNCATE. The rest of the suite runs every service through this same role, so what the
 * product does needs no more than db/app-role-privileges.ts grants.
 */
describe("the application's database role", () => {
  const outcome = (statement: ReturnType<typeof sql>) =>
    getDb()
      .execute(statement)
      .then(
        () => "applied",
        (e: unknown) => String((e as { cause?: Error }).cause?.message ?? (e as Error).message),
      );

  it("is not the owner of the tables it serves", async () => {
    const rows = await getDb().execute<{ me: string; owner: string; superuser: boolean }>(sql`
      select current_user as me, tableowner as owner,
             (select rolsuper from pg_roles where rolname = current_user) as superuser
        from pg_tables where schemaname = 'public' and tablename = 'revisions'`);
    expect(rows.rows[0].me).not.toBe(rows.rows[0].owner);
    expect(rows.rows[0].superuser).toBe(false);
  });

  it.each([
    ["alter table revisions disable trigger revisions_immutable", /must be owner/],
    ["alter table signatures disable trigger all", /must be owner/],
    ["drop trigger revisions_immutable on revisions", /must be owner/],
    ["set session_replication_role = replica", /permission denied/],
    ["create table smuggled (id int)", /permission denied for schema public/],
    ["truncate revisions", /permission denied/],
  ])("cannot run %s", async (statement, refusal) => {
    expect(await outcome(sql.raw(statement))).toMatch(refusal);
  });

  it.each([
    "update revisions set title = 'forged'",
    "delete from revisions",
    "update signatures set meaning = 'approved'",
    "delete from signatures",
    "update audit_events set action = 'nothing'",
    "delete from audit_events",
    "update solution_results set ionic_strength_molal = 1",
    "delete from solution_results",
    "update block_results set ionic_strength_molal = 1",
    "delete from block_results",
    "update solution_parents set volume_ml = 1",
    "delete from solution_parents",
    "insert into block_species select * from block_species",
    "update block_species set species = 'NaCl'",
    "delete from block_species",
    "update attachments set sha256 = 'x'",
    "delete from attachments",
    "delete from entries",
    "delete from users",
  ])("has no privilege for %s", async (statement) => {
    // Refused when the statement is planned, before any row is read: even an empty table
    // or a WHERE that matches nothing gets the same answer.
    expect(await outcome(sql.raw(`${statement} where false`))).toMatch(/permission denied/);
  });

  it("may close a block row, and change the rows the product changes", async () => {
    for (const statement of [
      "update block_results set to_revision = to_revision",
      "update entries set title = title",
      "update users set session_version = session_version",
      "update invitations set revoked_at = revoked_at",
      "update mail_outbox set attempts = attempts",
    ])
      expect(await outcome(sql.raw(`${statement} where false`)), statement).toBe("applied");
  });
});
