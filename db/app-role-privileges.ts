import type { Pool } from "pg";

/**
 * What the application's own database role may do. Migrations run as the owner of the
 * tables; the server connects as a role that owns nothing, so it can neither change the
 * schema nor switch off the guard triggers (`ALTER TABLE … DISABLE TRIGGER` needs the
 * owner), and the records the product keeps forever cannot even be addressed by an UPDATE
 * or DELETE: those privileges are simply not granted.
 *
 * Every table: SELECT and INSERT (new tables are covered on the next migration run), except
 * the tables the database derives by itself, which the application only reads.
 * UPDATE only where the product changes a row after writing it, listed here with why.
 * DELETE nowhere: Ionleaf removes nothing (archiving is a column, withdrawal a timestamp).
 */
const DERIVED_TABLES: Record<string, string> = {
  block_species: "the finder's species index, kept by triggers on block_results (0010)",
};

const UPDATABLE_TABLES: Record<string, string> = {
  users: "role, activation, password and session version change",
  entries: "status, current and signed revision pointers move forward",
  invitations: "accepted or withdrawn",
  review_requests: "decided",
  mail_outbox: "sent, failed, retried",
  trace_mappings: "a lab's column mapping for an instrument layout is replaced",
};

/** Columns the application may set on otherwise unchangeable rows. */
const UPDATABLE_COLUMNS: Record<string, string[]> = {
  // A solution row is closed at the revision that dropped or changed it; its values never change.
  block_results: ["to_revision"],
};

/** Grants the application role exactly the privileges above (idempotent: revokes first). */
export async function grantAppRolePrivileges(owner: Pool, appRole: string): Promise<void> {
  const role = quoteIdentifier(appRole);
  const client = await owner.connect();
  try {
    await client.query("begin");
    const db = await client.query<{ db: string }>("select current_database() as db");
    await client.query(`grant connect on database ${quoteIdentifier(db.rows[0].db)} to ${role}`);
    await client.query(`grant usage on schema public to ${role}`);
    await client.query(`revoke all on all tables in schema public from ${role}`);
    await client.query(`revoke all on all sequences in schema public from ${role}`);
    await client.query(`grant select, insert on all tables in schema public to ${role}`);
    await client.query(`grant usage, select on all sequences in schema public to ${role}`);
    for (const table of Object.keys(DERIVED_TABLES))
      await client.query(`revoke insert on ${quoteIdentifier(table)} from ${role}`);
    for (const table of Object.keys(UPDATABLE_TABLES))
      await client.query(`grant update on ${quoteIdentifier(table)} to ${role}`);
    for (const [table, columns] of Object.entries(UPDATABLE_COLUMNS))
      await client.query(
        `grant update (${columns.map(quoteIdentifier).join(", ")}) on ${quoteIdentifier(table)} to ${role}`,
      );
    await client.query("commit");
  } catch (error) {
    await client.query("rollback");
    throw error;
  } finally {
    client.release();
  }
}

function quoteIdentifier(name: string): string {
  if (!/^[a-z_][a-z0-9_]*$/.test(name)) throw new Error(`not a plain identifier: ${name}`);
  return `"${name}"`;
}
