import { authedRoute } from "@/lib/http/route";
import { auditCsvStream, searchAudit } from "@/lib/labs/audit";

/** The lab's audit trail (admins): JSON pages, or `?format=csv` for all of it, streamed. */
export const GET = authedRoute(async (request, actor) => {
  const query = Object.fromEntries(new URL(request.url).searchParams);
  if (query.format === "csv") {
    const { format: _format, ...filters } = query;
    return new Response(auditCsvStream(actor, filters), {
      headers: {
        "content-type": "text/csv; charset=utf-8",
        "content-disposition": 'attachment; filename="ionleaf-audit.csv"',
      },
    });
  }
  const { format: _format, ...filters } = query;
  return Response.json(await searchAudit(actor, filters));
});
