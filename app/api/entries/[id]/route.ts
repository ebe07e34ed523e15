import { authedRoute, readJson } from "@/lib/http/route";
import { getEntryHeader, setEntryArchived } from "@/lib/notebook/entries";
import { getCurrentContent } from "@/lib/notebook/revisions";
import { archiveEntrySchema } from "@/lib/validation/entries";
import { parseInput } from "@/lib/validation/parse";

type Params = { id: string };

export const GET = authedRoute<Params>(async (_request, actor, params) => {
  const { id } = params;
  const { entry, authorName, projectName } = await getEntryHeader(actor, id);
  const current = await getCurrentContent(actor, id);
  return Response.json({
    entry: { id: entry.id, title: entry.title, status: entry.status, revision: entry.currentRevisionNumber, authorName, projectName, archived: entry.archivedAt !== null },
    content: current.content,
  });
});

export const PATCH = authedRoute<Params>(async (request, actor, params) => {
  const { archived } = parseInput(archiveEntrySchema, await readJson(request));
  await setEntryArchived(actor, params.id, archived);
  return Response.json({ ok: true, archived });
});
