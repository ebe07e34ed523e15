import { authedRoute } from "@/lib/http/route";
import { suggestSpecies } from "@/lib/finder/species-suggestions";

/** Type-ahead for the finder's species field: the catalogue and the lab's own species. */
export const GET = authedRoute(async (request, actor) => {
  const query = Object.fromEntries(new URL(request.url).searchParams);
  return Response.json({ suggestions: await suggestSpecies(actor, query) });
});
