import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { StatusChip } from "@/components/entries/status-chip";
import { requireActor } from "@/lib/access/actor";
import { roleCan } from "@/lib/rules/role-permissions";
import { listEntries } from "@/lib/notebook/entries";

export const metadata: Metadata = { title: "Review queue" };

export default async function ReviewQueuePage() {
  const actor = await requireActor();
  if (!roleCan(actor.role, "review.read")) notFound();
  const submitted = await listEntries(actor, {
    status: "submitted",
    sort: "updatedAt",
    order: "asc",
  });
  return (
    <div className="space-y-6">
      <div>
        <h1 className="text-2xl font-semibold tracking-tight">Review queue</h1>
        <p className="text-sm text-ink-soft">
          Entries submitted for countersignature, oldest first.
        </p>
      </div>
      <ul className="divide-y divide-ink/5 card" aria-label="Submitted entries">
        {submitted.length === 0 ? (
          <li className="px-5 py-4 text-sm text-ink-soft">The queue is empty.</li>
        ) : null}
        {submitted.map((e) => (
          <li
            key={e.id}
            className="flex flex-wrap items-center justify-between gap-3 px-5 py-3 text-sm"
          >
            <span>
              <Link
                href={`/entries/${e.id}`}
                className="font-medium hover:text-copper-700 hover:underline"
              >
                {e.title}
              </Link>
              <span className="text-ink-soft">
                {" "}
                · {e.authorName} · {e.projectName}
              </span>
            </span>
            <span className="flex items-center gap-3 text-xs text-ink-soft">
              submitted revision {e.revision},{" "}
              {new Date(e.updatedAt).toLocaleString("en-GB", {
                dateStyle: "medium",
                timeStyle: "short",
              })}
              <StatusChip status={e.status} />
            </span>
          </li>
        ))}
      </ul>
    </div>
  );
}
