import { authedRoute } from "@/lib/http/route";
import { solutionsCsvStream } from "@/lib/notebook/solution-finder";

/** Every solution the finder's query matches, as CSV, streamed. */
export const GET = authedRoute(async (request, actor) => {
  const query = Object.fromEntries(new URL(request.url).searchParams);
  return new Response(await solutionsCsvStream(actor, query), {
    headers: {
      "content-type": "text/csv; charset=utf-8",
      "content-disposition": 'attachment; filename="ionleaf-solutions.csv"',
    },
  });
});
