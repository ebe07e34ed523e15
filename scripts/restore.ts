/**
 * `npm run restore -- <backup folder> [--force] [--database-url URL] [--upload-dir DIR]`:
 * checks every file of the backup against its manifest first (a damaged backup is refused
 * and nothing is touched), then restores the database with pg_restore into an empty
 * database (a non-empty one only with --force) and the attachment files.
 * It connects as the owner of the tables (DATABASE_OWNER_URL; restoring is DDL) and grants the
 * app's role (DATABASE_URL's, or --app-role) its privileges again afterwards.
 * Without options it restores into the `npm start` installation; stop the app first.
 */
import path from "node:path";
import { DamagedBackupError, restoreBackup } from "./support/backup";
import {
  installationAppRole,
  installationDatabaseUrl,
  installationUploadDir,
  takeFlag,
  takeOption,
} from "./support/installation";

async function main() {
  const argv = process.argv.slice(2);
  const force = takeFlag(argv, "--force");
  const databaseUrl = takeOption(argv, "--database-url") ?? installationDatabaseUrl();
  const appRole = takeOption(argv, "--app-role") ?? installationAppRole(databaseUrl);
  const uploadDir = path.resolve(takeOption(argv, "--upload-dir") ?? installationUploadDir());
  if (argv.length !== 1 || argv[0].startsWith("--"))
    throw new Error(
      "usage: npm run restore -- <backup folder> [--force] [--database-url OWNER_URL] [--app-role ROLE] [--upload-dir DIR]",
    );
  const result = await restoreBackup({
    folder: path.resolve(argv[0]),
    databaseUrl,
    uploadDir,
    force,
    appRole,
  });
  console.log(
    `[ionleaf] restored the database${appRole ? ` (privileges granted to ${appRole})` : ""} and ${result.files} files (${result.filesSkipped} already present) in ${result.seconds.toFixed(1)} s`,
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
