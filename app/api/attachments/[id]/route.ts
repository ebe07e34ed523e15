import { Readable } from "node:stream";
import { openAttachment, recordDownload } from "@/lib/attachments/download";
import { authedRoute } from "@/lib/http/route";

export const runtime = "nodejs";

/**
 * `?variant=original|web|thumb`. Range requests answer 206; images and PDFs are shown inline,
 * everything else is a download; the browser is told never to guess the type.
 */
export const GET = authedRoute<{ id: string }>(async (request, actor, { id }) => {
  const url = new URL(request.url);
  const variant = url.searchParams.get("variant");
  const file = await openAttachment(actor, id, variant, request.headers.get("range"));
  if ((variant ?? "original") === "original" && !file.range) await recordDownload(actor, id);
  const headers: Record<string, string> = {
    "content-type": file.contentType,
    "content-length": String(file.sizeBytes),
    "content-disposition": file.disposition,
    "x-content-type-options": "nosniff",
    "accept-ranges": "bytes",
    // Content-addressed bytes never change; still private to the signed-in member.
    "cache-control": "private, max-age=3600",
  };
  if (file.range)
    headers["content-range"] = `bytes ${file.range.start}-${file.range.end}/${file.totalBytes}`;
  return new Response(Readable.toWeb(file.stream) as ReadableStream<Uint8Array>, {
    status: file.range ? 206 : 200,
    headers,
  });
});
