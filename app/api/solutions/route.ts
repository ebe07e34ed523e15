import { authedRoute } from "@/lib/http/route";
import { searchSolutions } from "@/lib/notebook/solution-finder";

/** One page of the lab's solutions; the query string is the finder page's (422 by field). */
export const GET = authedRoute(async (request, actor) => {
  const query = Object.fromEntries(new URL(request.url).searchParams);
  return Response.json(await searchSolutions(actor, query));
});
