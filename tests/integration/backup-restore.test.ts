// @vitest-environment node
import { spawnSync } from "node:child_process";
import { cpSync, existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { Client } from "pg";
import sharp from "sharp";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { insertProject } from "@/db/queries/projects";
import { uploadAttachments } from "@/lib/attachments/upload";
import { defaultSolutionBlockInput } from "@/lib/document/block-defaults";
import { createEntry } from "@/lib/notebook/entries";
import { saveEntryContent } from "@/lib/notebook/save-entry";
import { getDb } from "@/lib/server/database";
import {
  createBackup,
  DamagedBackupError,
  MANIFEST_NAME,
  restoreBackup,
  sha256File,
  type BackupResult,
} from "@/scripts/support/backup";
import { createLabWithMembers } from "../support/db";

// A backup taken with `npm run backup`'s code, restored into a brand-new database and upload
// folder, must hold every row of every table and every file byte for byte; a backup altered
// afterwards must be refused before anything is touched.
// Backups and restores run as the owner of the tables; the app's role owns nothing.
const sourceUrl = process.env.DATABASE_OWNER_URL ?? process.env.DATABASE_URL!;
const appUrl = process.env.DATABASE_URL!;
const appRole = decodeURIComponent(new URL(appUrl).username);
const superuserUrl = process.env.TEST_SUPERUSER_URL;
const uploadDir = process.env.UPLOAD_DIR!;
const suffix = `${process.pid}`;
const databases = [`ionleaf_restore_${suffix}`, `ionleaf_restore_tampered_${suffix}`];
const urlOf = (db: string) => sourceUrl.replace(/\/[^/?]+(\?|$)/, `/${db}$1`);

async function withClient<T>(url: string, fn: (c: Client) => Promise<T>): Promise<T> {
  const client = new Client({ connectionString: url });
  await client.connect();
  try {
    return await fn(client);
  } finally {
    await client.end();
  }
}

/** Every table (md5 of its rows in a fixed order, and the count) and every sequence's value. */
async function fingerprint(url: string): Promise<Record<string, string>> {
  return withClient(url, async (c) => {
    const out: Record<string, string> = {};
    const tables = await c.query<{ schema: string; name: string }>(`
      select table_schema as schema, table_name as name from information_schema.tables
       where table_type = 'BASE TABLE' and table_schema not in ('pg_catalog', 'information_schema')
       order by 1, 2`);
    for (const { schema, name } of tables.rows) {
      const q = `"${schema}"."${name}"`;
      const r = await c.query<{ n: string; md5: string }>(
        `select count(*) as n, md5(coalesce(string_agg(t::text, E'\\n' order by t::text), '')) as md5 from ${q} t`,
      );
      out[q] = `${r.rows[0].n} rows, ${r.rows[0].md5}`;
    }
    const sequences = await c.query<{ schema: string; name: string }>(
      "select schemaname as schema, sequencename as name from pg_sequences order by 1, 2",
    );
    for (const { schema, name } of sequences.rows) {
      const r = await c.query<{ last_value: string; is_called: boolean }>(
        `select last_value, is_called from "${schema}"."${name}"`,
      );
      out[`sequence ${schema}.${name}`] = `${r.rows[0].last_value} ${r.rows[0].is_called}`;
    }
    return out;
  });
}

async function fileHashes(root: string): Promise<Record<string, string>> {
  const { readdir } = await import("node:fs/promises");
  const entries = await readdir(root, { recursive: true, withFileTypes: true });
  const out: Record<string, string> = {};
  for (const e of entries.filter((x) => x.isFile() && !x.name.includes(".partial-"))) {
    const file = path.join(e.parentPath, e.name);
    out[path.relative(root, file)] = await sha256File(file);
  }
  return out;
}

function uploadRequest(name: string, bytes: Uint8Array, type: string): Request {
  const form = new FormData();
  form.append("file", new Blob([bytes as Uint8Array<ArrayBuffer>], { type }), name);
  return new Request("http://localhost/api/upload", { method: "POST", body: form });
}

describe("backup and restore", () => {
  if (!superuserUrl)
    throw new Error("TEST_SUPERUSER_URL is not set: run the tests through npm test");
  const scratch = mkdtempSync(path.join(tmpdir(), "ionleaf-backup-test-"));
  let backup: BackupResult;
  let entryId: string;

  beforeAll(async () => {
    // Data of every kind a backup must keep: an entry with two revisions (a solution block,
    // so stored results and block rows too), a photo (original plus derived copies) and a file.
    const { lab, members } = await createLabWithMembers(["admin", "researcher"]);
    const author = members.researcher;
    const project = await insertProject(getDb(), {
      labId: lab.id,
      name: "Backed up",
      createdById: members.admin.userId,
    });
    entryId = (await createEntry(author, { projectId: project.id, title: "Before the backup" })).id;
    const block = (molality: number) => ({
      type: "solutionBlock",
      attrs: defaultSolutionBlockInput({
        blockId: "blk-backup",
        name: "Electrolyte",
        components: [{ formula: "KCl", amount: molality, unit: "mol/kg" }],
      }),
    });
    const text = (t: string) => ({ type: "paragraph", content: [{ type: "text", text: t }] });
    await saveEntryContent(author, entryId, {
      baseRevision: 0,
      title: "Before the backup",
      content: { type: "doc", content: [text("First weighing."), block(0.1)] },
    });
    await saveEntryContent(author, entryId, {
      baseRevision: 1,
      title: "Before the backup",
      content: { type: "doc", content: [text("Second weighing."), block(0.2)] },
    });
    const photo = await sharp({
      create: { width: 30, height: 20, channels: 3, background: "#3d6bb8" },
    })
      .png()
      .toBuffer();
    await uploadAttachments(author, entryId, uploadRequest("cell.png", photo, "image/png"));
    await uploadAttachments(
      author,
      entryId,
      uploadRequest("notes.txt", new TextEncoder().encode(`backup test ${suffix}\n`), "text/plain"),
    );
    for (const db of databases)
      await withClient(superuserUrl, (c) =>
        c.query(`create database ${db} owner ${new URL(sourceUrl).username}`),
      );
    backup = await createBackup({
      databaseUrl: sourceUrl,
      uploadDir,
      outDir: path.join(scratch, "backups"),
    });
  });

  afterAll(async () => {
    for (const db of databases)
      await withClient(superuserUrl, (c) => c.query(`drop database if exists ${db}`));
    rmSync(scratch, { recursive: true, force: true });
  });

  it("writes a manifest listing the dump and every stored file with its SHA-256 and size", async () => {
    expect(path.basename(backup.folder)).toMatch(/^ionleaf-\d{4}-\d\d-\d\dT\d\d-\d\d-\d\dZ/);
    const manifest = backup.manifest;
    expect(manifest.database.path).toBe("database.dump");
    expect(await sha256File(path.join(backup.folder, "database.dump"))).toBe(
      manifest.database.sha256,
    );
    const stored = await fileHashes(uploadDir);
    const listed = Object.fromEntries(
      manifest.files.map((f) => [f.path.replace(/^files\//, ""), f.sha256]),
    );
    expect(listed).toEqual(stored);
    // The photo's original, its derived copies and the text file at least.
    expect(
      manifest.files.filter((f) => f.path.startsWith("files/objects/")).length,
    ).toBeGreaterThanOrEqual(2);
    expect(manifest.files.some((f) => f.path.startsWith("files/derived/"))).toBe(true);
  });

  it("restores into an empty database and upload folder: every table's rows and every file alike", async () => {
    const target = urlOf(databases[0]);
    const restoredUploads = path.join(scratch, "restored-uploads");
    const result = await restoreBackup({
      folder: backup.folder,
      databaseUrl: target,
      uploadDir: restoredUploads,
      appRole,
    });
    expect(result.files).toBe(backup.manifest.files.length);
    const [before, after] = await Promise.all([fingerprint(sourceUrl), fingerprint(target)]);
    expect(Object.keys(before).length).toBeGreaterThan(16);
    expect(after).toEqual(before);
    const revisions = await withClient(target, (c) =>
      c.query<{ number: number }>("select number from revisions where entry_id = $1 order by 1", [
        entryId,
      ]),
    );
    expect(revisions.rows.map((r) => r.number)).toEqual([1, 2]);
    // The app's role has its privileges again, and still no more than them.
    const asApp = appUrl.replace(/\/[^/?]+(\?|$)/, `/${databases[0]}$1`);
    await withClient(asApp, async (c) => {
      const r = await c.query("select count(*) from revisions where entry_id = $1", [entryId]);
      expect(Number(r.rows[0].count)).toBe(2);
      if (appRole !== decodeURIComponent(new URL(sourceUrl).username))
        await expect(c.query("delete from revisions")).rejects.toThrow(/permission denied/);
    });
    expect(await fileHashes(restoredUploads)).toEqual(await fileHashes(uploadDir));

    // A second restore into the now filled database is refused, unless forced.
    await expect(
      restoreBackup({ folder: backup.folder, databaseUrl: target, uploadDir: restoredUploads }),
    ).rejects.toThrow(/not empty.*--force/);
    await restoreBackup({
      folder: backup.folder,
      databaseUrl: target,
      uploadDir: restoredUploads,
      force: true,
    });
    expect(await fingerprint(target)).toEqual(before);
  });

  it("refuses a tampered backup before touching the database, with a message naming the file", async () => {
    const tampered = path.join(scratch, "tampered");
    cpSync(backup.folder, tampered, { recursive: true });
    const victim = backup.manifest.files.find((f) => f.path.endsWith(".txt") || f.size < 200)!;
    const file = path.join(tampered, victim.path);
    const bytes = readFileSync(file);
    bytes[0] ^= 0x01; // one bit, same size
    writeFileSync(file, bytes);
    const target = urlOf(databases[1]);
    const uploads = path.join(scratch, "tampered-uploads");
    const error = await restoreBackup({ folder: tampered, databaseUrl: target, uploadDir: uploads })
      .then(() => null)
      .catch((e: unknown) => e);
    expect(error).toBeInstanceOf(DamagedBackupError);
    expect((error as Error).message).toContain(`${victim.path}: SHA-256 differs from the manifest`);
    const tables = await withClient(target, (c) =>
      c.query("select 1 from pg_tables where schemaname = 'public'"),
    );
    expect(tables.rowCount).toBe(0);
    expect(existsSync(uploads)).toBe(false);

    // The command line says so too, and exits with status 2.
    const cli = spawnSync(
      path.resolve("node_modules/.bin/tsx"),
      ["scripts/restore.ts", tampered, "--database-url", target, "--upload-dir", uploads],
      { encoding: "utf8" },
    );
    expect(cli.status).toBe(2);
    expect(cli.stderr).toMatch(/damaged or incomplete, so nothing was restored/);

    // A shortened dump and a manifest that is not JSON are refused as well.
    writeFileSync(file, readFileSync(path.join(backup.folder, victim.path)));
    const dump = path.join(tampered, "database.dump");
    writeFileSync(dump, readFileSync(dump).subarray(0, 100));
    await expect(
      restoreBackup({ folder: tampered, databaseUrl: target, uploadDir: uploads }),
    ).rejects.toThrow(/database\.dump: 100 bytes, the manifest says/);
    writeFileSync(path.join(tampered, MANIFEST_NAME), "{ not json");
    await expect(
      restoreBackup({ folder: tampered, databaseUrl: target, uploadDir: uploads }),
    ).rejects.toThrow(/manifest\.json is missing or not JSON/);
  });
});
