"use client";
import { useActionState } from "react";
import { Field } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { SubmitButton } from "@/components/ui/submit-button";
import { initialActionState, type ActionState } from "@/lib/contract/action-state";
import { ROLE_LABELS, ROLES } from "@/lib/contract/vocabulary";

export function InviteForm({
  action,
}: {
  action: (prev: ActionState, form: FormData) => Promise<ActionState>;
}) {
  const [state, formAction] = useActionState(action, initialActionState);
  return (
    <form action={formAction} className="space-y-4" noValidate aria-label="Invite a member">
      <FormMessage message={state.message} tone={state.ok ? "success" : "error"} />
      <div className="grid gap-4 sm:grid-cols-[1fr_12rem_auto] sm:items-end">
        <Field id="invite-email" label="E-mail" errors={state.fieldErrors?.email}>
          {(aria) => (
            <input
              {...aria}
              name="email"
              type="email"
              className="input"
              defaultValue={state.ok ? "" : (state.values?.email ?? "")}
            />
          )}
        </Field>
        <Field id="invite-role" label="Role" errors={state.fieldErrors?.role}>
          {(aria) => (
            <select
              {...aria}
              name="role"
              className="input"
              defaultValue={state.values?.role ?? "researcher"}
            >
              {ROLES.map((role) => (
                <option key={role} value={role}>
                  {ROLE_LABELS[role].name} — {ROLE_LABELS[role].duty}
                </option>
              ))}
            </select>
          )}
        </Field>
        <SubmitButton pendingLabel="Sending…">Send invitation</SubmitButton>
      </div>
    </form>
  );
}
