import { getTraceView } from "@/lib/attachments/trace-view";
import { authedRoute } from "@/lib/http/route";

export const runtime = "nodejs";

/** The export read back: summary, plot series (downsampled), peaks; the lab's mapping applied. */
export const GET = authedRoute<{ id: string }>(async (_request, actor, { id }) =>
  Response.json(await getTraceView(actor, id)),
);
