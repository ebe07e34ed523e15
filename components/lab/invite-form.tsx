"use client";
import { useActionState } from "react";
import { Field } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { SubmitButton } from "@/components/ui/submit-button";
import { initialActionState, type ActionState } from "@/lib/contract/action-state";

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
              <option value="researcher">Researcher — writes entries</option>
              <option value="supervisor">Supervisor — countersigns</option>
              <option value="admin">Admin — manages the lab</option>
            </select>
          )}
        </Field>
        <SubmitButton pendingLabel="Sending…">Send invitation</SubmitButton>
      </div>
    </form>
  );
}
