import { authedRoute, readJson } from "@/lib/http/route";
import { createEntry, listEntries } from "@/lib/notebook/entries";

export const GET = authedRoute(async (request, actor) => {
  const query = Object.fromEntries(new URL(request.url).searchParams);
  return Response.json({ entries: await listEntries(actor, query) });
});

export const POST = authedRoute(async (request, actor) => {
  const created = await createEntry(actor, await readJson(request));
  return Response.json(created, { status: 201 });
});
