import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { InviteForm } from "@/components/lab/invite-form";
import { MemberRow } from "@/components/lab/member-row";
import { WithdrawInvitation } from "@/components/lab/withdraw-invitation";
import { requireActor } from "@/lib/access/actor";
import { roleCan } from "@/lib/rules/role-permissions";
import { listRecentAudit } from "@/lib/labs/audit";
import { listMembers, listPendingInvitations } from "@/lib/labs/members";
import { mailCatcherConfigured } from "@/lib/mail/catcher";
import { getLabOutbox } from "@/lib/labs/outbox";
import { ActionButton } from "@/components/ui/action-button";
import {
  changeRoleAction,
  inviteMemberAction,
  setActivationAction,
  retryOutboxAction,
  withdrawInvitationAction,
} from "./actions";

export const metadata: Metadata = { title: "Lab settings" };

export default async function LabSettingsPage() {
  const actor = await requireActor();
  if (!roleCan(actor.role, "lab.manage")) notFound();
  const [members, invitations, audit, outbox] = await Promise.all([
    listMembers(actor),
    listPendingInvitations(actor),
    listRecentAudit(actor, 10),
    getLabOutbox(actor),
  ]);
  const unsent = outbox.filter((m) => m.state !== "sent").length;
  return (
    <div className="space-y-8">
      <div className="flex flex-wrap items-end justify-between gap-4">
        <div>
          <h1 className="text-2xl font-semibold tracking-tight">Lab settings</h1>
          <p className="text-sm text-ink-soft">
            Members, roles and invitations. Deactivated members cannot sign in; their entries stay
            in the notebook.
          </p>
        </div>
        {mailCatcherConfigured() ? (
          <Link href="/lab/mail" className="btn-quiet">
            Mail catcher inbox
          </Link>
        ) : null}
      </div>

      <section className="card p-6">
        <h2 className="mb-4 text-base font-semibold">Invite a member</h2>
        <InviteForm action={inviteMemberAction} />
        {invitations.length ? (
          <ul className="mt-5 divide-y divide-ink/5 text-sm" aria-label="Open invitations">
            {invitations.map((i) => (
              <li key={i.id} className="flex flex-wrap items-center justify-between gap-2 py-2">
                <span>
                  {i.email} <span className="text-ink-soft">as {i.role}</span>
                </span>
                <span className="flex items-center gap-3 text-xs text-ink-soft">
                  sent by {i.invitedBy}, expires {i.expiresAt.toISOString().slice(0, 10)}
                  <WithdrawInvitation
                    invitationId={i.id}
                    email={i.email}
                    withdraw={withdrawInvitationAction}
                  />
                </span>
              </li>
            ))}
          </ul>
        ) : null}
      </section>

      <section className="overflow-x-auto card p-6">
        <h2 className="mb-2 text-base font-semibold">Members</h2>
        <table className="w-full text-sm">
          <thead className="text-left text-xs tracking-wide text-ink-soft uppercase">
            <tr>
              <th className="py-2">Member</th>
              <th className="py-2">Role</th>
              <th className="py-2">Status</th>
              <th className="py-2 text-right">Access</th>
            </tr>
          </thead>
          <tbody className="divide-y divide-ink/5">
            {members.map((m) => (
              <MemberRow
                key={m.id}
                member={m}
                isSelf={m.id === actor.userId}
                changeRole={changeRoleAction}
                setActivation={setActivationAction}
              />
            ))}
          </tbody>
        </table>
      </section>

      <section className="card p-6" aria-labelledby="outbox-heading">
        <div className="mb-3 flex flex-wrap items-center justify-between gap-3">
          <h2 id="outbox-heading" className="text-base font-semibold">
            Notification mails
          </h2>
          {unsent > 0 ? <ActionButton action={retryOutboxAction} label="Retry unsent now" /> : null}
        </div>
        <p className="mb-3 text-xs text-ink-soft">
          Review requests and decisions are mailed after the action is saved; a failed send is
          retried with growing delays and shown here.
        </p>
        {outbox.length === 0 ? (
          <p className="text-sm text-ink-soft">No notification mails yet.</p>
        ) : (
          <ul className="divide-y divide-ink/5 text-sm" aria-label="Notification mails">
            {outbox.map((m) => (
              <li key={m.id} className="flex flex-wrap items-center justify-between gap-2 py-2">
                <span>
                  {m.subject} <span className="text-ink-soft">to {m.to}</span>
                </span>
                <span
                  className={`chip ${m.state === "sent" ? "bg-lagoon-50 text-lagoon-700" : m.state === "failing" ? "bg-red-50 text-red-800" : "bg-ink/5 text-ink-soft"}`}
                  title={m.lastError ?? undefined}
                >
                  {m.state === "failing" ? `failing after ${m.attempts} attempt(s)` : m.state}
                </span>
              </li>
            ))}
          </ul>
        )}
      </section>

      <section className="card p-6">
        <div className="mb-3 flex flex-wrap items-center justify-between gap-3">
          <h2 className="text-base font-semibold">Recent lab activity</h2>
          <Link href="/lab/audit" className="text-sm text-copper-700 hover:underline">
            Full audit trail →
          </Link>
        </div>
        <ol className="space-y-1.5 text-sm">
          {audit.map((e) => (
            <li key={e.id} className="flex gap-3">
              <time className="w-36 shrink-0 font-mono text-xs text-ink-soft tabular">
                {e.at.toISOString().slice(0, 16).replace("T", " ")}
              </time>
              <span>
                <strong className="font-medium">{e.actorName ?? "system"}</strong> ·{" "}
                {e.action.replace(/[._]/g, " ")}
              </span>
            </li>
          ))}
        </ol>
      </section>
    </div>
  );
}
