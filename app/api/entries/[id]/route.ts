import { authedRoute, readJson } from "@/lib/http/route";
import { ENTRY_ACTIONS } from "@/lib/rules/entry-rules";
import { setEntryArchived } from "@/lib/notebook/entries";
import { openEntry } from "@/lib/notebook/revisions";
import { archiveEntrySchema } from "@/lib/validation/entries";
import { parseInput } from "@/lib/validation/parse";

type Params = { id: string };

export const GET = authedRoute<Params>(async (_request, actor, params) => {
  const { entry, authorName, projectName, actions, current } = await openEntry(actor, params.id);
  return Response.json({
    entry: {
      id: entry.id,
      title: entry.title,
      status: entry.status,
      revision: entry.currentRevisionNumber,
      authorName,
      projectName,
      archived: entry.archivedAt !== null,
      /** What the signed-in member may do with it now (lib/rules/entry-rules.ts). */
      actions: ENTRY_ACTIONS.filter((action) => actions[action].allowed),
    },
    content: current.content,
  });
});

export const PATCH = authedRoute<Params>(async (request, actor, params) => {
  const { archived } = parseInput(archiveEntrySchema, await readJson(request));
  await setEntryArchived(actor, params.id, archived);
  return Response.json({ ok: true, archived });
});
