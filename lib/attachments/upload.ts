import "server-only";
import type { AttachmentDto } from "@/lib/contract/traces";
import { dirname } from "node:path";
import { insertAuditEvent } from "@/db/queries/audit";
import { insertAttachment } from "@/db/queries/attachments";
import { getEnv } from "@/lib/env";
import { AppError } from "@/lib/errors";
import { loadEntryFor } from "@/lib/notebook/entry-access";
import { assertCan, type Actor } from "@/lib/rules/authorize";
import { getDb } from "@/lib/server/database";
import { derivedKey, getStorage, originalKey } from "@/lib/storage";
import { parseTraceFile } from "@/lib/traces/parse-file";
import type { ColumnMapping, TraceSummary } from "@/lib/traces";
import { detectFileType } from "./detect-type";
import { checkedFileName } from "./file-name";
import { makePhotoCopies } from "./photo";
import { receiveUpload, type ReceivedFile } from "./receive-upload";
import { layoutKeyOf } from "./trace-layout";
import { plotViewKey, plotViewOf, writePlotViewFile } from "./trace-plot-view";
import { findTraceMapping } from "@/db/queries/attachments";

const PHOTO_TYPES = new Set(["image/png", "image/jpeg", "image/webp", "image/gif", "image/tiff"]);
const TEXT_TYPES = new Set(["text/plain", "text/csv"]);
const MAX_FILES_PER_UPLOAD = 20;

/**
 * Receives files for an entry the member may edit: streamed to disk and hashed, named and typed
 * from their bytes, parsed when they are instrument exports, given WebP copies when they are
 * photos, stored under their SHA-256, then recorded. Any refusal or failure leaves nothing
 * behind: temporary files are removed, objects this upload stored are removed again, and the
 * rows are written in one transaction at the end.
 */
export async function uploadAttachments(
  actor: Actor,
  entryId: string,
  request: Request,
): Promise<AttachmentDto[]> {
  assertCan(actor, "entry.write");
  const entry = await loadEntryFor(getDb(), actor, entryId, "edit");
  const env = getEnv();
  const upload = await receiveUpload(request, {
    maxFileBytes: env.UPLOAD_MAX_BYTES,
    maxFiles: MAX_FILES_PER_UPLOAD,
  });
  const storage = getStorage();
  const written: string[] = [];
  try {
    const prepared: Prepared[] = [];
    for (const file of upload.files)
      prepared.push(await prepare(file, env.UPLOAD_ALLOWED_TYPES, actor.labId));
    for (const p of prepared) {
      for (const object of p.objects) {
        if ((await storage.size(object.key)) === null) {
          await storage.putFile(object.key, object.path, object.contentType);
          written.push(object.key);
        }
      }
    }
    const dtos = await getDb().transaction(async (tx) => {
      const out: AttachmentDto[] = [];
      for (const p of prepared) {
        const { row, created } = await insertAttachment(tx, {
          labId: actor.labId,
          entryId: entry.id,
          sha256: p.file.sha256,
          sizeBytes: p.file.sizeBytes,
          detectedType: p.type,
          kind: p.kind,
          originalName: p.name,
          storedPath: originalKey(p.file.sha256),
          derivatives: p.derivatives,
          uploaderId: actor.userId,
          parsedSummary: p.summary as unknown as Record<string, unknown> | null,
        });
        if (created) {
          await insertAuditEvent(tx, {
            labId: actor.labId,
            actorId: actor.userId,
            action: "attachment.uploaded",
            targetType: "entry",
            targetId: entry.id,
            details: {
              attachment: row.id,
              name: row.originalName,
              sha256: row.sha256,
              sizeBytes: row.sizeBytes,
            },
          });
        }
        out.push(toAttachmentDto(row, !created));
      }
      return out;
    });
    return dtos;
  } catch (error) {
    // Objects this upload put in the storage go again when their rows did not commit.
    await Promise.all(written.map((key) => storage.remove(key).catch(() => undefined)));
    throw error;
  } finally {
    await upload.cleanup();
  }
}

interface Prepared {
  file: ReceivedFile;
  name: string;
  type: string;
  kind: "photo" | "trace" | "file";
  summary: TraceSummary | null;
  derivatives: Record<string, unknown>;
  objects: { key: string; path: string; contentType: string }[];
}

async function prepare(file: ReceivedFile, allowed: string[], labId: string): Promise<Prepared> {
  const name = checkedFileName(file.originalName);
  if (file.sizeBytes === 0) {
    throw new AppError("invalid_input", `“${name}” is empty; nothing was stored.`, {
      fieldErrors: { file: ["The file is empty."] },
    });
  }
  const type = await detectFileType(file.path);
  if (!allowed.includes(type)) {
    throw new AppError(
      "unsupported_media_type",
      `“${name}” is ${type === "application/octet-stream" ? "of an unknown type" : type}, which this lab does not accept.`,
      { fieldErrors: { file: [`Accepted: ${allowed.join(", ")}.`] } },
    );
  }
  const objects = [{ key: originalKey(file.sha256), path: file.path, contentType: type }];
  let kind: "photo" | "trace" | "file" = "file";
  let summary: TraceSummary | null = null;
  let derivatives: Record<string, unknown> = {};
  if (PHOTO_TYPES.has(type)) {
    const photo = await makePhotoCopies(file.path, dirname(file.path)).catch(() => {
      throw new AppError(
        "invalid_input",
        `“${name}” could not be read as an image; nothing was stored.`,
      );
    });
    kind = "photo";
    derivatives = {
      width: photo.width,
      height: photo.height,
      copies: photo.copies.map((c) => ({
        name: c.name,
        key: derivedKey(file.sha256, c.name),
        width: c.width,
        height: c.height,
        sizeBytes: c.sizeBytes,
      })),
    };
    for (const c of photo.copies)
      objects.push({
        key: derivedKey(file.sha256, c.name),
        path: c.path,
        contentType: "image/webp",
      });
  } else if (TEXT_TYPES.has(type)) {
    const first = await parseTraceFile(file.path);
    // A layout this lab mapped before is read with that mapping straight away.
    const saved = await findTraceMapping(
      getDb(),
      labId,
      layoutKeyOf(first.summary.columns.map((c) => c.name)),
    );
    const parsed = saved ? await parseTraceFile(file.path, { mapping: saved.mapping }) : first;
    if (parsed.summary.technique !== "unknown" || parsed.summary.points > 0) {
      kind = "trace";
      summary = parsed.summary;
      // The plot view is computed now, from the parse already in memory, and kept beside the
      // original: opening the entry then reads a few kilobytes instead of parsing the export.
      const mapping = saved ? (saved.mapping as ColumnMapping) : null;
      objects.push({
        key: plotViewKey(file.sha256, mapping),
        path: await writePlotViewFile(dirname(file.path), plotViewOf(parsed, mapping)),
        contentType: "application/json",
      });
    }
  }
  return { file, name, type, kind, summary, derivatives, objects };
}

export function toAttachmentDto(
  row: {
    id: string;
    originalName: string;
    kind: "photo" | "trace" | "file";
    detectedType: string;
    sizeBytes: number;
    sha256: string;
    createdAt: Date;
    derivatives: Record<string, unknown>;
    parsedSummary: Record<string, unknown> | null;
  },
  duplicate = false,
): AttachmentDto {
  const summary = row.parsedSummary as unknown as TraceSummary | null;
  return {
    id: row.id,
    name: row.originalName,
    kind: row.kind,
    detectedType: row.detectedType,
    sizeBytes: row.sizeBytes,
    sha256: row.sha256,
    createdAt: row.createdAt.toISOString(),
    duplicate,
    ...(summary
      ? {
          trace: {
            technique: summary.technique,
            points: summary.points,
            cycles: summary.cycles.length,
            problems: summary.problems,
          },
        }
      : {}),
    ...(row.kind === "photo"
      ? { photo: { width: Number(row.derivatives.width), height: Number(row.derivatives.height) } }
      : {}),
  };
}
