import { authedRoute } from "@/lib/http/route";
import { searchSolutions } from "@/lib/notebook/solution-finder";

export const GET = authedRoute(async (request, actor) => {
  const query = Object.fromEntries(new URL(request.url).searchParams);
  return Response.json({ solutions: await searchSolutions(actor, query) });
});
