import { authedRoute, readJson } from "@/lib/http/route";
import { createProject, listProjects } from "@/lib/projects/service";

export const GET = authedRoute(async (_request, actor) =>
  Response.json({ projects: await listProjects(actor) }),
);

export const POST = authedRoute(async (request, actor) => {
  return Response.json(await createProject(actor, await readJson(request)), { status: 201 });
});
