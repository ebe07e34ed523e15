import { authedRoute } from "@/lib/http/route";
import { getStockComposition } from "@/lib/notebook/lineage/stocks";

/**
 * A stock's stored composition for the editor: `?entry=&block=&revision=` (revision: default
 * the entry's current one). Another lab's entry: 404; a bad query: 422 by field.
 */
export const GET = authedRoute(async (request, actor) => {
  const query = Object.fromEntries(new URL(request.url).searchParams);
  return Response.json(await getStockComposition(actor, query));
});
