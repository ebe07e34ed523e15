import { authedRoute } from "@/lib/http/route";
import { getRevision, getRevisionSolutions } from "@/lib/notebook/revisions";

export const GET = authedRoute<{ id: string; number: string }>(async (_request, actor, { id, number }) => {
  const n = Number(number);
  const revision = await getRevision(actor, id, n);
  const solutions = await getRevisionSolutions(actor, id, n);
  return Response.json({ revision, solutions });
});
