import { authedRoute } from "@/lib/http/route";
import { getRevisionHistory } from "@/lib/notebook/revisions";

export const GET = authedRoute<{ id: string }>(async (_request, actor, { id }) => {
  return Response.json({ revisions: await getRevisionHistory(actor, id) });
});
