import { saveTraceMappingFor } from "@/lib/attachments/trace-view";
import { authedRoute, readJson } from "@/lib/http/route";
import { parseInput } from "@/lib/validation/parse";
import { traceMappingSchema } from "@/lib/validation/traces";

export const runtime = "nodejs";

/** The mapping dialog's answer (`{ mapping }`): saved for the lab's files of this layout. */
export const PUT = authedRoute<{ id: string }>(async (request, actor, { id }) => {
  const { mapping } = parseInput(traceMappingSchema, await readJson(request));
  return Response.json(await saveTraceMappingFor(actor, id, mapping));
});
