/**
 * `npm run restore -- <backup folder> [--force] [--database-url URL] [--upload-dir DIR]`:
 * checks every file of the backup against its manifest first (a damaged backup is refused
 * and nothing is touched), then restores the database with pg_restore into an empty
 * database (a non-empty one only with --force) and the attachment files.
 * Without options it restores into the `npm start` installation; stop the app first.
 */
import path from "node:path";
import { DamagedBackupError, restoreBackup } from "./support/backup";
import {
  installationDatabaseUrl,
  installationUploadDir,
  takeFlag,
  takeOption,
} from "./support/installation";

async function main() {
  const argv = process.argv.slice(2);
  const force = takeFlag(argv, "--force");
  const databaseUrl = takeOption(argv, "--database-url") ?? installationDatabaseUrl();
  const uploadDir = path.resolve(takeOption(argv, "--upload-dir") ?? installationUploadDir());
  if (argv.length !== 1 || argv[0].startsWith("--"))
    throw new Error(
      "usage: npm run restore -- <backup folder> [--force] [--database-url URL] [--upload-dir DIR]",
    );
  const result = await restoreBackup({
    folder: path.resolve(argv[0]),
    databaseUrl,
    uploadDir,
    force,
  });
  console.log(
    `[ionleaf] restored the database and ${result.files} files (${result.filesSkipped} already present) in ${result.seconds.toFixed(1)} s`,
  );
}

main().catch((error: unknown) => {
  const message = error instanceof Error ? error.message : String(error);
  console.error(
    error instanceof DamagedBackupError
      ? `[ionleaf] ${message}`
      : `[ionleaf] restore failed: ${message}`,
  );
  process.exit(error instanceof DamagedBackupError ? 2 : 1);
});
