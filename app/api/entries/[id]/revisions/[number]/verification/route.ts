import { authedRoute } from "@/lib/http/route";
import { verifyRevision } from "@/lib/notebook/verification";
import { parseRevisionNumber } from "@/lib/validation/parse";

/** The revision's hash recomputed, its signatures checked, the entry's chain of revisions. */
export const GET = authedRoute<{ id: string; number: string }>(async (_request, actor, params) => {
  return Response.json(await verifyRevision(actor, params.id, parseRevisionNumber(params.number)));
});
