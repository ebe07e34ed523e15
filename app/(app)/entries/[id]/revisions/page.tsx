import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { requireActor } from "@/lib/access/actor";
import { isAppError } from "@/lib/errors";
import { SignatureManifest } from "@/components/review/signature-manifest";
import { getEntryHistory } from "@/lib/notebook/review-view";
import { getRevisionHistory } from "@/lib/notebook/revisions";

export const metadata: Metadata = { title: "History" };

const EVENT_LABELS: Record<string, string> = {
  revision: "Saved",
  "amendment revision": "Amendment saved",
  submitted: "Submitted",
  returned: "Returned",
  countersigned: "Countersigned",
};

export default async function RevisionHistoryPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const actor = await requireActor();
  let data;
  try {
    data = {
      header: await getEntryHistory(actor, id),
      revisions: await getRevisionHistory(actor, id),
    };
  } catch (error) {
    if (isAppError(error) && error.code === "not_found") notFound();
    throw error;
  }
  return (
    <div className="mx-auto max-w-3xl space-y-6">
      <div>
        <Link href={`/entries/${id}`} className="text-sm text-copper-700 hover:underline">
          ← Back to the entry
        </Link>
        <h1 className="mt-1 text-2xl font-semibold tracking-tight">History</h1>
        <p className="text-sm text-ink-soft">
          {data.header.entry.title}. Every save that changed the content is kept, unchangeable, with
          its SHA-256.
        </p>
      </div>
      <section aria-labelledby="review-history" className="space-y-2">
        <h2 id="review-history" className="text-base font-semibold">
          Submissions, returns and signatures
        </h2>
        <ol className="divide-y divide-ink/5 card" aria-label="Review history">
          {data.header.events
            .filter((e) => e.kind !== "revision")
            .map((e) => (
              <li key={`${e.at}-${e.kind}`} className="px-5 py-3 text-sm">
                <p>
                  <span className="font-medium">{EVENT_LABELS[e.kind] ?? e.kind}</span>
                  <span className="text-ink-soft">
                    {" "}
                    · revision {e.revision} · {e.who} ·{" "}
                    {new Date(e.at).toLocaleString("en-GB", {
                      dateStyle: "medium",
                      timeStyle: "short",
                    })}
                  </span>
                </p>
                {e.text ? <p className="mt-0.5 text-ink-soft">{e.text}</p> : null}
              </li>
            ))}
          {data.header.events.every((e) => e.kind === "revision") ? (
            <li className="px-5 py-4 text-sm text-ink-soft">Not submitted yet.</li>
          ) : null}
        </ol>
      </section>
      <SignatureManifest signatures={data.header.signatures} />
      <h2 className="text-base font-semibold">Revisions</h2>
      <ol className="divide-y divide-ink/5 card" aria-label="Revisions">
        {data.revisions.map((r) => (
          <li
            key={r.number}
            className="flex flex-wrap items-center justify-between gap-3 px-5 py-3 text-sm"
          >
            <span>
              <Link
                href={`/entries/${id}/revisions/${r.number}`}
                className="font-medium hover:text-copper-700 hover:underline"
              >
                Revision {r.number}
              </Link>
              <span className="text-ink-soft">
                {" "}
                · {r.authorName} ·{" "}
                {new Date(r.createdAt).toLocaleString("en-GB", {
                  dateStyle: "medium",
                  timeStyle: "medium",
                })}
              </span>
            </span>
            <code
              className="font-mono text-xs text-ink-faint"
              title="SHA-256 of the canonical document"
            >
              {r.contentHash.slice(0, 16)}…
            </code>
            {r.amends !== null ? (
              <p className="w-full text-xs text-amber-800">
                Amends countersigned revision {r.amends}: {r.amendmentReason}
              </p>
            ) : null}
            <ul
              className="w-full text-xs text-ink-soft"
              aria-label={`Changes in revision ${r.number}`}
            >
              {r.changes.map((c) => (
                <li key={c}>· {c}</li>
              ))}
            </ul>
          </li>
        ))}
        {data.revisions.length === 0 ? (
          <li className="px-5 py-4 text-sm text-ink-soft">Not saved yet.</li>
        ) : null}
      </ol>
    </div>
  );
}
