import { authedRoute, readJson } from "@/lib/http/route";
import { returnEntry } from "@/lib/notebook/review";

/** `{ revision, comment }`: back to the author, editable again. */
export const POST = authedRoute<{ id: string }>(async (request, actor, { id }) => {
  await returnEntry(actor, id, await readJson(request));
  return Response.json({ ok: true, status: "returned" });
});
