/**
 * Backups of one Ionleaf installation: the database (pg_dump, custom format: one consistent
 * snapshot) and the attachment files under the upload root, with a manifest of every file's
 * SHA-256 and size. `npm run backup` and `npm run restore` (scripts/backup.ts, restore.ts)
 * call these; tests/integration/backup-restore.test.ts round-trips one.
 *
 * Consistency between the two halves: attachment files are content-addressed and written
 * (complete, by one rename) before their database row commits, and never changed or removed
 * afterwards. The dump is taken first, so every file a row of the dump names is already on
 * disk when the files are copied; a file written after the dump is an unreferenced extra.
 */
import { execFile } from "node:child_process";
import { createHash } from "node:crypto";
import { createReadStream, existsSync, readdirSync } from "node:fs";
import { copyFile, mkdir, readFile, readdir, rename, rm, stat, writeFile } from "node:fs/promises";
import path from "node:path";
import { Client, Pool } from "pg";
import { grantAppRolePrivileges } from "@/db/app-role-privileges";

export const MANIFEST_NAME = "manifest.json";
const DUMP_NAME = "database.dump";
const FILES_DIR = "files";

export interface ManifestFile {
  /** Path inside the backup folder, with forward slashes ("files/objects/ab/cd/…"). */
  path: string;
  sha256: string;
  size: number;
}

export interface Manifest {
  format: "ionleaf-backup";
  version: 1;
  createdAt: string;
  database: ManifestFile & { pgDump: string; server: string };
  /** The attachment files, relative to the upload root under `files/`. */
  files: ManifestFile[];
}

/** The PostgreSQL client binaries: the newest /usr/lib/postgresql/N/bin (as provision.sh). */
export function findPgBin(): string {
  const root = "/usr/lib/postgresql";
  const versions = existsSync(root)
    ? readdirSync(root)
        .filter((v) => existsSync(path.join(root, v, "bin", "pg_dump")))
        .sort((a, b) => Number(b) - Number(a))
    : [];
  if (!versions.length)
    throw new Error(
      "pg_dump not found under /usr/lib/postgresql/*/bin: install Debian's postgresql-client",
    );
  return path.join(root, versions[0], "bin");
}

function run(tool: string, args: string[]): Promise<string> {
  return new Promise((resolve, reject) => {
    execFile(
      path.join(findPgBin(), tool),
      args,
      { maxBuffer: 64 * 1024 * 1024 },
      (error, stdout, stderr) => {
        if (error) reject(new Error(`${tool} failed: ${stderr.trim() || error.message}`));
        else resolve(stdout);
      },
    );
  });
}

export async function sha256File(file: string): Promise<string> {
  const hash = createHash("sha256");
  for await (const chunk of createReadStream(file)) hash.update(chunk as Buffer);
  return hash.digest("hex");
}

/** Every regular file under `root`, relative, sorted; in-flight staging files are skipped. */
async function listFiles(root: string): Promise<string[]> {
  if (!existsSync(root)) return [];
  const entries = await readdir(root, { recursive: true, withFileTypes: true });
  return entries
    .filter((e) => e.isFile() && !e.name.includes(".partial-"))
    .map((e) => path.relative(root, path.join(e.parentPath, e.name)))
    .sort();
}

async function describe(folder: string, relative: string): Promise<ManifestFile> {
  const file = path.join(folder, relative);
  const [info, sha256] = await Promise.all([stat(file), sha256File(file)]);
  return { path: relative.split(path.sep).join("/"), sha256, size: info.size };
}

async function withClient<T>(url: string, fn: (c: Client) => Promise<T>): Promise<T> {
  const client = new Client({ connectionString: url });
  await client.connect();
  try {
    return await fn(client);
  } finally {
    await client.end();
  }
}

const stamp = (d: Date) =>
  d
    .toISOString()
    .replace(/\.\d+Z$/, "Z")
    .replace(/:/g, "-");

export interface BackupResult {
  folder: string;
  manifest: Manifest;
  bytes: number;
  seconds: number;
}

/**
 * Writes `<outDir>/ionleaf-<UTC time>/` with database.dump, files/ and manifest.json. It is
 * written under a `.partial` name and renamed when complete, so an interrupted backup never
 * looks like a finished one.
 */
export async function createBackup(options: {
  databaseUrl: string;
  uploadDir: string;
  outDir: string;
}): Promise<BackupResult> {
  const started = performance.now();
  const now = new Date();
  let name = `ionleaf-${stamp(now)}`;
  for (let i = 2; existsSync(path.join(options.outDir, name)); i++)
    name = `ionleaf-${stamp(now)}-${i}`;
  const folder = path.join(options.outDir, name);
  const partial = `${folder}.partial`;
  await rm(partial, { recursive: true, force: true });
  await mkdir(path.join(partial, FILES_DIR), { recursive: true });
  try {
    // 1. The database: pg_dump reads everything in one repeatable-read transaction.
    const server = await withClient(options.databaseUrl, async (c) => {
      const r = await c.query<{ server_version: string }>("show server_version");
      return r.rows[0].server_version;
    });
    await run("pg_dump", [
      "--format=custom",
      "--compress=6",
      `--file=${path.join(partial, DUMP_NAME)}`,
      `--dbname=${options.databaseUrl}`,
    ]);
    const pgDump = (await run("pg_dump", ["--version"])).trim();
    // 2. The files, after the dump (see the note at the top).
    const files: ManifestFile[] = [];
    for (const relative of await listFiles(options.uploadDir)) {
      const target = path.join(partial, FILES_DIR, relative);
      await mkdir(path.dirname(target), { recursive: true });
      await copyFile(path.join(options.uploadDir, relative), target);
      files.push(await describe(partial, path.join(FILES_DIR, relative)));
    }
    const manifest: Manifest = {
      format: "ionleaf-backup",
      version: 1,
      createdAt: now.toISOString(),
      database: { ...(await describe(partial, DUMP_NAME)), pgDump, server },
      files,
    };
    await writeFile(path.join(partial, MANIFEST_NAME), `${JSON.stringify(manifest, null, 2)}\n`);
    await rename(partial, folder);
    const bytes = manifest.database.size + files.reduce((sum, f) => sum + f.size, 0);
    return { folder, manifest, bytes, seconds: (performance.now() - started) / 1000 };
  } catch (error) {
    await rm(partial, { recursive: true, force: true });
    throw error;
  }
}

/** A backup that is incomplete, altered or not a backup: nothing was restored. */
export class DamagedBackupError extends Error {
  constructor(
    folder: string,
    readonly problems: string[],
  ) {
    super(
      `The backup in ${folder} is damaged or incomplete, so nothing was restored:\n` +
        problems.map((p) => `  - ${p}`).join("\n"),
    );
    this.name = "DamagedBackupError";
  }
}

/** Checks every file against the manifest (size and SHA-256); throws DamagedBackupError. */
export async function verifyBackup(folder: string): Promise<Manifest> {
  let manifest: Manifest;
  try {
    manifest = JSON.parse(await readFile(path.join(folder, MANIFEST_NAME), "utf8")) as Manifest;
  } catch (error) {
    throw new DamagedBackupError(folder, [
      `${MANIFEST_NAME} is missing or not JSON (${error instanceof Error ? error.message : String(error)})`,
    ]);
  }
  if (
    manifest?.format !== "ionleaf-backup" ||
    manifest.version !== 1 ||
    !manifest.database ||
    !Array.isArray(manifest.files)
  )
    throw new DamagedBackupError(folder, [`${MANIFEST_NAME} is not an Ionleaf backup manifest`]);
  const problems: string[] = [];
  const listed = new Set<string>();
  for (const entry of [manifest.database, ...manifest.files]) {
    const relative = String(entry.path);
    listed.add(relative);
    const file = path.resolve(folder, relative);
    if (!file.startsWith(path.resolve(folder) + path.sep) || !/^[0-9a-f]{64}$/.test(entry.sha256)) {
      problems.push(`${relative}: not a valid manifest line`);
      continue;
    }
    const info = await stat(file).catch(() => null);
    if (!info?.isFile()) problems.push(`${relative}: missing`);
    else if (info.size !== entry.size)
      problems.push(`${relative}: ${info.size} bytes, the manifest says ${entry.size}`);
    else if ((await sha256File(file)) !== entry.sha256)
      problems.push(`${relative}: SHA-256 differs from the manifest (the file was altered)`);
  }
  for (const relative of await listFiles(path.join(folder, FILES_DIR))) {
    const inBackup = `${FILES_DIR}/${relative.split(path.sep).join("/")}`;
    if (!listed.has(inBackup)) problems.push(`${inBackup}: not in the manifest`);
  }
  if (problems.length) throw new DamagedBackupError(folder, problems);
  return manifest;
}

/** Tables, views and sequences in the database outside PostgreSQL's own schemas. */
async function countRelations(databaseUrl: string): Promise<number> {
  return withClient(databaseUrl, async (c) => {
    const r = await c.query<{ n: string }>(`
      select count(*) as n from pg_class c join pg_namespace n on n.oid = c.relnamespace
       where n.nspname not in ('pg_catalog', 'information_schema')
         and n.nspname not like 'pg\\_toast%' and n.nspname not like 'pg\\_temp%'
         and c.relkind in ('r', 'p', 'v', 'm', 'S', 'f')`);
    return Number(r.rows[0].n);
  });
}

export interface RestoreResult {
  files: number;
  filesSkipped: number;
  seconds: number;
}

/**
 * Verifies the backup, then restores the database into `databaseUrl` (which must be empty
 * unless `force`: then objects of the same name are dropped first) in one transaction, and
 * the files into `uploadDir` (a file already there with the same bytes is kept; one with
 * other bytes is refused unless `force`). Each restored file is hashed again.
 */
export async function restoreBackup(options: {
  folder: string;
  /** The owner of the tables to be (migrations' DATABASE_OWNER_URL): restoring is DDL. */
  databaseUrl: string;
  uploadDir: string;
  force?: boolean;
  /** The role the app serves as, granted its privileges again (db/app-role-privileges.ts). */
  appRole?: string;
}): Promise<RestoreResult> {
  const started = performance.now();
  const { folder, force = false } = options;
  const manifest = await verifyBackup(folder);

  const existing = await countRelations(options.databaseUrl);
  if (existing > 0 && !force)
    throw new Error(
      `The target database is not empty (${existing} tables, views or sequences); restore into an empty database, or pass --force to replace what the backup contains.`,
    );
  const clashes: string[] = [];
  for (const f of manifest.files) {
    const target = path.join(options.uploadDir, f.path.slice(FILES_DIR.length + 1));
    if (existsSync(target) && (await sha256File(target)) !== f.sha256) clashes.push(target);
  }
  if (clashes.length && !force)
    throw new Error(
      `The upload folder already holds other bytes under ${clashes.length} of the backup's names (first: ${clashes[0]}); pass --force to overwrite them.`,
    );

  await run("pg_restore", [
    "--no-owner",
    "--no-acl",
    "--exit-on-error",
    "--single-transaction",
    ...(force ? ["--clean", "--if-exists"] : []),
    `--dbname=${options.databaseUrl}`,
    path.join(folder, manifest.database.path),
  ]);
  // The dump's grants are left out (the roles may differ here); the app role gets exactly its
  // privileges again, as `npm run db:migrate` gives them.
  if (options.appRole) {
    const pool = new Pool({ connectionString: options.databaseUrl, max: 1 });
    try {
      await grantAppRolePrivileges(pool, options.appRole);
    } finally {
      await pool.end();
    }
  }

  let skipped = 0;
  for (const f of manifest.files) {
    const target = path.join(options.uploadDir, f.path.slice(FILES_DIR.length + 1));
    if (existsSync(target) && !clashes.includes(target)) {
      skipped++;
      continue;
    }
    await mkdir(path.dirname(target), { recursive: true });
    const staging = `${target}.partial-restore-${process.pid}`;
    await copyFile(path.join(folder, f.path), staging);
    if ((await sha256File(staging)) !== f.sha256) {
      await rm(staging, { force: true });
      throw new Error(`${target}: the copy does not match the manifest (disk error?)`);
    }
    await rename(staging, target);
  }
  return {
    files: manifest.files.length - skipped,
    filesSkipped: skipped,
    seconds: (performance.now() - started) / 1000,
  };
}
