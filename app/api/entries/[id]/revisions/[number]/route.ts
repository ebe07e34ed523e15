import { authedRoute } from "@/lib/http/route";
import { getRevisionWithSolutions } from "@/lib/notebook/revisions";
import { parseRevisionNumber } from "@/lib/validation/parse";

/** One revision with the solutions the server computed and stored for it. */
export const GET = authedRoute<{ id: string; number: string }>(async (_request, actor, params) => {
  return Response.json(
    await getRevisionWithSolutions(actor, params.id, parseRevisionNumber(params.number)),
  );
});
