import { buildEntryArchive } from "@/lib/export/archive";
import { htmlToPdf } from "@/lib/export/pdf";
import { printHtml } from "@/lib/export/print-html";
import { AppError } from "@/lib/errors";
import { authedRoute } from "@/lib/http/route";
import { parseRevisionNumber } from "@/lib/validation/parse";

export const runtime = "nodejs";

/** `?format=pdf|json&revision=n`: the signed record as a PDF with its manifest, or as JSON. */
export const GET = authedRoute<{ id: string }>(async (request, actor, { id }) => {
  const url = new URL(request.url);
  const format = url.searchParams.get("format") ?? "pdf";
  if (format !== "pdf" && format !== "json") {
    throw new AppError("invalid_input", "Choose format=pdf or format=json.", {
      fieldErrors: { format: ["pdf or json"] },
    });
  }
  const rawRevision = url.searchParams.get("revision");
  const revision = rawRevision === null ? null : parseRevisionNumber(rawRevision);
  const archive = await buildEntryArchive(actor, id, revision, format);
  const base = `ionleaf-${archive.entry.id.slice(0, 8)}-r${archive.revision.number}`;
  if (format === "json") {
    return new Response(JSON.stringify(archive, null, 2), {
      headers: {
        "content-type": "application/json; charset=utf-8",
        "content-disposition": `attachment; filename="${base}.json"`,
      },
    });
  }
  const pdf = await htmlToPdf(printHtml(archive));
  return new Response(new Uint8Array(pdf), {
    headers: {
      "content-type": "application/pdf",
      "content-disposition": `attachment; filename="${base}.pdf"`,
      "x-content-type-options": "nosniff",
    },
  });
});
