import { authedRoute, readJson } from "@/lib/http/route";
import { countersignEntry } from "@/lib/notebook/review";

/** `{ revision, password, meaning, comment? }` → 201 with the signed hash and time. */
export const POST = authedRoute<{ id: string }>(async (request, actor, { id }) => {
  return Response.json(await countersignEntry(actor, id, await readJson(request)), { status: 201 });
});
