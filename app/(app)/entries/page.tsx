import type { Metadata } from "next";
import Link from "next/link";
import { EntryTable } from "@/components/entries/entry-table";
import { requireActor } from "@/lib/access/actor";
import { listProjects } from "@/lib/projects/service";

export const metadata: Metadata = { title: "Entries" };

export default async function EntriesPage() {
  const actor = await requireActor();
  const projects = await listProjects(actor);
  return (
    <div className="space-y-6">
      <div className="flex flex-wrap items-end justify-between gap-4">
        <div>
          <h1 className="text-2xl font-semibold tracking-tight">Entries</h1>
          <p className="text-sm text-ink-soft">
            Every page of the lab&apos;s notebook. Click a column to sort.
          </p>
        </div>
        <Link href="/entries/new" className="btn-primary">
          New entry
        </Link>
      </div>
      <EntryTable projects={projects.map(({ id, name }) => ({ id, name }))} />
    </div>
  );
}
