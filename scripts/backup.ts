/**
 * `npm run backup [folder] [--database-url URL] [--upload-dir DIR]`: a consistent snapshot of
 * the database (pg_dump, custom format) and the attachment files, with a manifest of SHA-256
 * hashes and sizes, in `<folder>/ionleaf-<UTC time>/` (default folder .data/backups).
 * Without options it backs up the `npm start` installation (scripts/support/installation.ts).
 */
import path from "node:path";
import { createBackup } from "./support/backup";
import {
  installationDatabaseUrl,
  installationUploadDir,
  ROOT,
  takeOption,
} from "./support/installation";

async function main() {
  const argv = process.argv.slice(2);
  const databaseUrl = takeOption(argv, "--database-url") ?? installationDatabaseUrl();
  const uploadDir = path.resolve(takeOption(argv, "--upload-dir") ?? installationUploadDir());
  if (argv.length > 1 || argv[0]?.startsWith("--"))
    throw new Error(
      "usage: npm run backup -- [folder] [--database-url OWNER_URL] [--upload-dir DIR]",
    );
  const outDir = path.resolve(argv[0] ?? path.join(ROOT, ".data/backups"));
  const result = await createBackup({ databaseUrl, uploadDir, outDir });
  console.log(
    `[ionleaf] backup written to ${result.folder}\n` +
      `  database dump ${(result.manifest.database.size / 1024).toFixed(0)} KiB, ` +
      `${result.manifest.files.length} files, ${(result.bytes / 1024 / 1024).toFixed(2)} MiB in all, ` +
      `${result.seconds.toFixed(1)} s`,
  );
}

main().catch((error: unknown) => {
  console.error(
    `[ionleaf] backup failed: ${error instanceof Error ? error.message : String(error)}`,
  );
  process.exit(1);
});
