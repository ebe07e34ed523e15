import { authedRoute } from "@/lib/http/route";
import { findSimilarSolutions } from "@/lib/notebook/similar-solutions";

/** The lab's solutions nearest to one block (?entry=&block=[&revision=]), with the distance. */
export const GET = authedRoute(async (request, actor) => {
  const query = Object.fromEntries(new URL(request.url).searchParams);
  return Response.json(await findSimilarSolutions(actor, query));
});
