import { authedRoute, readJson } from "@/lib/http/route";
import { updateStock } from "@/lib/notebook/lineage/stocks";

/**
 * `{ blockId, parentEntryId, parentBlockId, toRevision, baseRevision, reason? }`: a new revision
 * of the entry in which the block uses the stock's newer revision (an amendment, with its
 * reason, when the entry is countersigned).
 */
export const POST = authedRoute<{ id: string }>(async (request, actor, { id }) => {
  return Response.json(await updateStock(actor, id, await readJson(request)));
});
