import { authedRoute, readOptionalJson } from "@/lib/http/route";
import { submitEntry } from "@/lib/notebook/review";

/** Submit for countersignature: `{ reviewerId? }`; without one, every supervisor is asked. */
export const POST = authedRoute<{ id: string }>(async (request, actor, { id }) => {
  await submitEntry(actor, id, await readOptionalJson(request));
  return Response.json({ ok: true, status: "submitted" });
});
