"use client";
import { useActionState } from "react";
import { initialActionState, type ActionState } from "@/lib/contract/action-state";

type Action = (prev: ActionState, form: FormData) => Promise<ActionState>;

/** A one-button form for a server action, with its result announced beside it. */
export function ActionButton({
  action,
  label,
  className = "btn-quiet",
}: {
  action: Action;
  label: string;
  className?: string;
}) {
  const [state, run, pending] = useActionState(action, initialActionState);
  return (
    <form action={run} className="flex items-center gap-3">
      <button type="submit" className={className} disabled={pending}>
        {label}
      </button>
      {state.message ? (
        <span
          role={state.ok ? "status" : "alert"}
          className={`text-xs ${state.ok ? "text-lagoon-700" : "text-red-700"}`}
        >
          {state.message}
        </span>
      ) : null}
    </form>
  );
}
