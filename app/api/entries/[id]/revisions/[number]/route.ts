import { authedRoute } from "@/lib/http/route";
import { getRevisionWithSolutions } from "@/lib/notebook/revisions";

export const GET = authedRoute<{ id: string; number: string }>(
  async (_request, actor, { id, number }) => {
    return Response.json(await getRevisionWithSolutions(actor, id, Number(number)));
  },
);
