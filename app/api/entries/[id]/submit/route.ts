import { authedRoute } from "@/lib/http/route";
import { submitEntry } from "@/lib/notebook/entries";

export const POST = authedRoute<{ id: string }>(async (_request, actor, { id }) => {
  await submitEntry(actor, id);
  return Response.json({ ok: true, status: "submitted" });
});
