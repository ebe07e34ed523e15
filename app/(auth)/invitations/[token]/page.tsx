import type { Metadata } from "next";
import Link from "next/link";
import { inspectInvitation, invitationStateMessage } from "@/lib/labs/invitations";
import { AcceptInvitationForm } from "./accept-form";

export const metadata: Metadata = { title: "Join your lab" };

export default async function InvitationPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const state = await inspectInvitation(token);
  if (state.kind !== "open") {
    return (
      <section className="card p-7" data-testid="invitation-closed">
        <h1 className="text-lg font-semibold">This link cannot be used</h1>
        <p className="mt-2 text-sm text-ink-soft">{invitationStateMessage(state.kind)}</p>
        <Link href="/sign-in" className="mt-6 btn-quiet">
          Go to sign-in
        </Link>
      </section>
    );
  }
  return (
    <section className="card p-7">
      <h1 className="text-lg font-semibold">Join {state.labName}</h1>
      <p className="mt-1 mb-6 text-sm text-ink-soft">
        You were invited as a <strong>{state.role}</strong>. Confirm the address the invitation was
        sent to and choose a password to finish.
      </p>
      <AcceptInvitationForm token={token} />
    </section>
  );
}
