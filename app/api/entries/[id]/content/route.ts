import { authedRoute, readJson } from "@/lib/http/route";
import { saveEntryContent } from "@/lib/notebook/save-entry";

/** Autosave: 200 with the new revision number; 409 when the editor's base revision is stale. */
export const PUT = authedRoute<{ id: string }>(async (request, actor, { id }) => {
  return Response.json(await saveEntryContent(actor, id, await readJson(request)));
});
