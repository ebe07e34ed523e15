"use client";
import { useActionState } from "react";
import { initialActionState, type ActionState } from "@/lib/contract/action-state";

type Action = (prev: ActionState, form: FormData) => Promise<ActionState>;

/** Withdraws an open invitation: its link stops working at once. */
export function WithdrawInvitation({
  invitationId,
  email,
  withdraw,
}: {
  invitationId: string;
  email: string;
  withdraw: Action;
}) {
  const [state, action, pending] = useActionState(withdraw, initialActionState);
  return (
    <form action={action} className="flex items-center gap-2">
      <input type="hidden" name="invitationId" value={invitationId} />
      <button
        type="submit"
        className="btn-quiet px-2 py-1 text-xs"
        disabled={pending}
        aria-label={`Withdraw the invitation to ${email}`}
      >
        Withdraw
      </button>
      {state.message && !state.ok ? (
        <span role="alert" className="text-xs text-red-700">
          {state.message}
        </span>
      ) : null}
    </form>
  );
}
