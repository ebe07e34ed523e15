import { authedRoute, readJson } from "@/lib/http/route";
import { startAmendment } from "@/lib/notebook/review";

/** `{ reason }`: starts an amendment of a countersigned entry. */
export const POST = authedRoute<{ id: string }>(async (request, actor, { id }) => {
  await startAmendment(actor, id, await readJson(request));
  return Response.json({ ok: true, status: "amended" });
});
