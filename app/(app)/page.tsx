import type { Metadata } from "next";
import Link from "next/link";
import { StatusChip } from "@/components/entries/status-chip";
import { requireActor } from "@/lib/access/actor";
import { countReviewQueue, listEntries } from "@/lib/notebook/entries";
import type { EntryListItem } from "@/lib/contract/entries";
import { roleCan } from "@/lib/rules/role-permissions";
import { listProjects } from "@/lib/projects/service";

export const metadata: Metadata = { title: "Bench" };

function EntryList({
  title,
  entries,
  empty,
  testId,
}: {
  title: string;
  entries: EntryListItem[];
  empty: string;
  testId: string;
}) {
  return (
    <section className="card p-5" data-testid={testId}>
      <h2 className="mb-3 text-sm font-semibold tracking-wide text-ink-soft uppercase">{title}</h2>
      {entries.length === 0 ? <p className="text-sm text-ink-soft">{empty}</p> : null}
      <ul className="divide-y divide-ink/5">
        {entries.map((e) => (
          <li key={e.id} className="flex items-center justify-between gap-3 py-2 text-sm">
            <Link
              href={`/entries/${e.id}`}
              className="min-w-0 truncate font-medium hover:text-copper-700 hover:underline"
            >
              {e.title}
            </Link>
            <span className="flex shrink-0 items-center gap-2 text-xs text-ink-soft">
              {new Date(e.updatedAt).toLocaleDateString("en-GB", {
                day: "numeric",
                month: "short",
              })}
              <StatusChip status={e.status} />
            </span>
          </li>
        ))}
      </ul>
    </section>
  );
}

export default async function BenchPage() {
  const actor = await requireActor();
  const [projects, mine, queue] = await Promise.all([
    listProjects(actor),
    listEntries(actor, { author: "me", limit: 100 }), // newest first; split by status below
    countReviewQueue(actor),
  ]);
  const withStatus = (...statuses: string[]) =>
    mine.filter((e) => statuses.includes(e.status)).slice(0, 8);
  const drafts = withStatus("returned", "draft");
  const submitted = withStatus("submitted");
  const firstName = actor.name.replace(/^Dr\.\s*/, "").split(" ")[0];
  return (
    <div className="space-y-8">
      <div className="flex flex-wrap items-end justify-between gap-4">
        <div>
          <p className="text-sm text-ink-soft">Bench</p>
          <h1 className="text-2xl font-semibold tracking-tight">Good to see you, {firstName}</h1>
        </div>
        <div className="flex gap-2">
          <Link href="/solutions" className="btn-quiet">
            Find a solution
          </Link>
          <Link href="/entries/new" className="btn-primary">
            New entry
          </Link>
        </div>
      </div>

      {roleCan(actor.role, "review.read") ? (
        <Link
          href="/review"
          className="flex items-center justify-between card p-5 hover:border-copper-300"
          data-testid="review-count"
        >
          <span>
            <span className="block text-sm font-semibold">Review queue</span>
            <span className="text-sm text-ink-soft">
              Entries submitted for your countersignature
            </span>
          </span>
          <span className="font-mono text-3xl font-semibold text-copper-600 tabular">{queue}</span>
        </Link>
      ) : null}

      <div className="grid gap-5 lg:grid-cols-2">
        <EntryList
          title="My drafts"
          entries={drafts}
          empty="No drafts. Start one from a template."
          testId="my-drafts"
        />
        <EntryList
          title="Waiting for countersignature"
          entries={submitted}
          empty="Nothing submitted."
          testId="my-submitted"
        />
      </div>

      <section aria-labelledby="projects-heading" className="space-y-3">
        <h2
          id="projects-heading"
          className="text-sm font-semibold tracking-wide text-ink-soft uppercase"
        >
          Projects
        </h2>
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
