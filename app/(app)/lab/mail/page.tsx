import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { requireActor, assertCan } from "@/lib/access/actor";
import { roleCan } from "@/lib/rules/role-permissions";
import { listCaughtMessages, mailCatcherConfigured } from "@/lib/mail/catcher";

export const metadata: Metadata = { title: "Mail catcher" };
export const dynamic = "force-dynamic";

/** The local mail catcher's inbox (demo and tests only): admins follow invitation mails here. */
export default async function MailCatcherPage() {
  const actor = await requireActor();
  if (!roleCan(actor.role, "mail.read") || !mailCatcherConfigured()) notFound();
  assertCan(actor, "mail.read");
  let messages: Awaited<ReturnType<typeof listCaughtMessages>> = [];
  let unreachable = false;
  try {
    messages = await listCaughtMessages(actor.labId);
  } catch {
    unreachable = true;
  }
  return (
    <div className="space-y-6">
      <div>
        <h1 className="text-2xl font-semibold tracking-tight">Mail catcher</h1>
        <p className="text-sm text-ink-soft">
          Messages Ionleaf sent about this lab while mail goes to the local catcher. Nothing here
          left this machine.
        </p>
      </div>
      {unreachable ? (
        <p role="alert" className="card p-4 text-sm text-red-700">
          The mail catcher is not answering. Is `npm start` still running?
        </p>
      ) : null}
      {messages.length === 0 && !unreachable ? (
        <p className="card p-6 text-sm text-ink-soft">No messages yet.</p>
      ) : null}
      <ul className="space-y-4">
        {messages.map((m) => (
          <li key={m.id} className="card p-5" data-testid="caught-message">
            <div className="flex flex-wrap justify-between gap-2 text-sm">
              <p className="font-semibold">{m.subject}</p>
              <time className="font-mono text-xs text-ink-soft">
                {m.receivedAt.slice(0, 19).replace("T", " ")}
              </time>
            </div>
            <p className="text-xs text-ink-soft">
              to {m.to.join(", ")} · from {m.from}
            </p>
            <pre className="mt-3 rounded-md bg-paper-deep p-3 font-mono text-xs whitespace-pre-wrap">
              {m.text}
            </pre>
          </li>
        ))}
      </ul>
    </div>
  );
}
