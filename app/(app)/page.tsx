import type { Metadata } from "next";
import { requireActor } from "@/lib/access/actor";
import { listProjects } from "@/lib/projects/service";

export const metadata: Metadata = { title: "Bench" };

export default async function BenchPage() {
  const actor = await requireActor();
  const projects = await listProjects(actor);
  const firstName = actor.name.replace(/^Dr\.\s*/, "").split(" ")[0];
  return (
    <div className="space-y-8">
      <div>
        <p className="text-sm text-ink-soft">Bench</p>
        <h1 className="text-2xl font-semibold tracking-tight">Good to see you, {firstName}</h1>
      </div>
      <section aria-labelledby="projects-heading" className="space-y-3">
        <h2 id="projects-heading" className="text-sm font-semibold uppercase tracking-wide text-ink-soft">Projects</h2>
        <ul className="grid gap-4 md:grid-cols-2">
          {projects.map((p) => (
            <li key={p.id} className="card p-5">
              <p className="font-medium">{p.name}</p>
              <p className="mt-1 text-sm text-ink-soft">{p.description}</p>
            </li>
          ))}
        </ul>
      </section>
    </div>
  );
}
