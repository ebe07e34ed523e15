import type { Metadata } from "next";
import { requireActor } from "@/lib/access/actor";
import { entryTemplates } from "@/lib/document/templates";
import { listProjects } from "@/lib/projects/service";
import { NewEntryForm } from "./new-entry-form";

export const metadata: Metadata = { title: "New entry" };

export default async function NewEntryPage() {
  const actor = await requireActor();
  const projects = await listProjects(actor);
  return (
    <div className="mx-auto max-w-2xl space-y-6">
      <h1 className="text-2xl font-semibold tracking-tight">New entry</h1>
      <section className="card p-6">
        <NewEntryForm
          projects={projects}
          templates={entryTemplates.map(({ id, title, description }) => ({
            id,
            title,
            description,
          }))}
        />
      </section>
    </div>
  );
}
