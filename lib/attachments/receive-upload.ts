import "server-only";
import { mkdtemp, rm } from "node:fs/promises";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { Readable } from "node:stream";
import formidable, { errors as formidableErrors } from "formidable";
import { AppError } from "@/lib/errors";

export interface ReceivedFile {
  /** Where the bytes are, in this request's own temporary folder. */
  path: string;
  originalName: string;
  sizeBytes: number;
  /** Hex SHA-256 computed while the file was streamed to disk. */
  sha256: string;
}

export interface ReceivedUpload {
  files: ReceivedFile[];
  /** Removes the temporary folder and everything in it; safe to call more than once. */
  cleanup: () => Promise<void>;
}

/**
 * Streams a multipart upload to a temporary folder with formidable: never the whole file in
 * memory, the SHA-256 computed on the way. Over the size limit is 413; a client that goes away
 * mid-upload, or any other failure, removes every partial file before the error is raised.
 */
export async function receiveUpload(
  request: Request,
  limits: { maxFileBytes: number; maxFiles: number },
): Promise<ReceivedUpload> {
  const type = request.headers.get("content-type") ?? "";
  if (!type.toLowerCase().startsWith("multipart/form-data")) {
    throw new AppError("unsupported_media_type", "Send files as multipart/form-data.");
  }
  if (!request.body) throw new AppError("invalid_input", "The upload is empty.");
  const folder = await mkdtemp(join(tmpdir(), "ionleaf-upload-"));
  const cleanup = () => rm(folder, { recursive: true, force: true });
  const headers = Object.fromEntries(request.headers);
  // formidable reads a body without a length as empty unless it is declared chunked.
  if (!headers["content-length"] && !headers["transfer-encoding"])
    headers["transfer-encoding"] = "chunked";
  const nodeRequest = Object.assign(Readable.fromWeb(request.body as never), { headers });
  const form = formidable({
    uploadDir: folder,
    maxFiles: limits.maxFiles,
    maxFileSize: limits.maxFileBytes,
    maxTotalFileSize: limits.maxFileBytes * limits.maxFiles,
    maxFields: 10,
    maxFieldsSize: 64 * 1024,
    hashAlgorithm: "sha256",
    allowEmptyFiles: true,
    minFileSize: 0,
    keepExtensions: false,
  });
  keepRawFileNames(form);
  try {
    const [, fileMap] = await form.parse(nodeRequest as never);
    const files = Object.values(fileMap)
      .flat()
      .filter((f): f is NonNullable<typeof f> => Boolean(f))
      .map((f) => ({
        path: f.filepath,
        originalName: f.originalFilename ?? "",
        sizeBytes: f.size,
        sha256: String(f.hash),
      }));
    if (files.length === 0)
      throw new AppError("invalid_input", "Choose at least one file to upload.");
    return { files, cleanup };
  } catch (error) {
    await cleanup();
    throw asUploadError(error, limits.maxFileBytes);
  }
}

/**
 * formidable cuts a file name at its last backslash (an old browser habit of sending paths).
 * A name with a path separator must be refused, not silently shortened, so the name is read
 * as the client sent it and checked afterwards (checkedFileName).
 */
function keepRawFileNames(form: ReturnType<typeof formidable>): void {
  (form as unknown as { _getFileName: (header: string) => string | null })._getFileName = (
    header,
  ) => {
    const m = /\bfilename=("(.*?)"|([^()<>{}[\]@,;:"?=\s/\t]+))($|;\s)/i.exec(header);
    if (!m) return null;
    return (m[2] || m[3] || "")
      .replace(/%22/g, '"')
      .replace(/&#(\d{4});/g, (_, code: string) => String.fromCharCode(Number(code)));
  };
}

function asUploadError(error: unknown, maxFileBytes: number): unknown {
  if (error instanceof AppError) return error;
  const code = (error as { code?: number; httpCode?: number }).code;
  const mb = Math.round(maxFileBytes / (1024 * 1024));
  if (
    code === formidableErrors.biggerThanMaxFileSize ||
    code === formidableErrors.biggerThanTotalMaxFileSize
  )
    return new AppError(
      "payload_too_large",
      `A file is larger than the limit of ${mb} MB; nothing was stored.`,
    );
  if (code === formidableErrors.maxFilesExceeded)
    return new AppError("invalid_input", "Too many files in one upload.");
  if (code === formidableErrors.aborted)
    return new AppError("invalid_input", "The upload was interrupted; nothing was stored.");
  if ((error as { httpCode?: number }).httpCode === 400 || code !== undefined)
    return new AppError("invalid_input", "The upload could not be read; nothing was stored.");
  // The connection dropped mid-stream (the request body errored).
  return new AppError("invalid_input", "The upload was interrupted; nothing was stored.");
}
