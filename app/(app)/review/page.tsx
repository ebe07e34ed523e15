import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { requireActor } from "@/lib/access/actor";
import { getReviewQueue } from "@/lib/notebook/review";
import { roleCan } from "@/lib/rules/role-permissions";

export const metadata: Metadata = { title: "Review queue" };

export default async function ReviewQueuePage() {
  const actor = await requireActor();
  if (!roleCan(actor.role, "review.read")) notFound();
  const queue = await getReviewQueue(actor);
  return (
    <div className="space-y-6">
      <div>
        <h1 className="text-2xl font-semibold tracking-tight">Review queue</h1>
        <p className="text-sm text-ink-soft">
          Entries submitted for your countersignature, oldest first. Your own entries go to another
          supervisor.
        </p>
      </div>
      <ul className="divide-y divide-ink/5 card" aria-label="Submitted entries">
        {queue.length === 0 ? (
          <li className="px-5 py-4 text-sm text-ink-soft">The queue is empty.</li>
        ) : null}
        {queue.map((e) => (
          <li
            key={e.entryId}
            className="flex flex-wrap items-center justify-between gap-3 px-5 py-3 text-sm"
          >
            <span>
              <Link
                href={`/review/${e.entryId}`}
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
              {e.amendment ? (
                <span className="chip bg-amber-50 text-amber-800">amendment</span>
              ) : null}
              {e.addressedToMe ? (
                <span className="chip bg-copper-50 text-copper-700">asked of you</span>
              ) : null}
              revision {e.revision}, submitted{" "}
              {new Date(e.submittedAt).toLocaleString("en-GB", {
                dateStyle: "medium",
                timeStyle: "short",
              })}
            </span>
          </li>
        ))}
      </ul>
    </div>
  );
}
