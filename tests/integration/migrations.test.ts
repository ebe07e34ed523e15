// @vitest-environment node
import { Client } from "pg";
import { afterAll, describe, expect, it } from "vitest";
import { runMigrations } from "@/scripts/migrate";

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
    expect(tables.rows.map((r) => r.tablename)).toEqual(
      expect.arrayContaining([
        "labs",
        "users",
        "invitations",
        "audit_events",
        "sign_in_attempts",
        "projects",
        "entries",
        "revisions",
        "solutions",
        "solution_components",
        "signatures",
        "attachments",
        "species",
      ]),
    );
    const triggers = await withClient(targetUrl, (c) =>
      c.query<{ tgname: string }>(
        "select tgname from pg_trigger where not tgisinternal order by 1",
      ),
    );
    expect(triggers.rows.map((r) => r.tgname)).toEqual(
      expect.arrayContaining(["revisions_immutable", "signatures_immutable"]),
    );
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
