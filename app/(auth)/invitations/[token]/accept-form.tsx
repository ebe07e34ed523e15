"use client";
import { useActionState } from "react";
import { Field } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { SubmitButton } from "@/components/ui/submit-button";
import { initialActionState } from "@/lib/contract/action-state";
import { acceptInvitationAction } from "./actions";

export function AcceptInvitationForm({ token }: { token: string }) {
  const [state, formAction] = useActionState(acceptInvitationAction, initialActionState);
  return (
    <form action={formAction} className="space-y-4" noValidate>
      <input type="hidden" name="token" value={token} />
      <FormMessage message={state.message} />
      <Field
        id="email"
        label="E-mail"
        hint="The address this invitation was sent to."
        errors={state.fieldErrors?.email}
      >
        {(aria) => (
          <input
            {...aria}
            name="email"
            type="email"
            autoComplete="email"
            className="input"
            defaultValue={state.values?.email ?? ""}
          />
        )}
      </Field>
      <Field id="name" label="Your name" errors={state.fieldErrors?.name}>
        {(aria) => (
          <input
            {...aria}
            name="name"
            autoComplete="name"
            className="input"
            defaultValue={state.values?.name ?? ""}
          />
        )}
      </Field>
      <Field
        id="password"
        label="Choose a password"
        hint="At least 10 characters, letters mixed with digits or symbols."
        errors={state.fieldErrors?.password}
      >
        {(aria) => (
          <input
            {...aria}
            name="password"
            type="password"
            autoComplete="new-password"
            className="input"
          />
        )}
      </Field>
      <Field
        id="confirmPassword"
        label="Repeat the password"
        errors={state.fieldErrors?.confirmPassword}
      >
        {(aria) => (
          <input
            {...aria}
            name="confirmPassword"
            type="password"
            autoComplete="new-password"
            className="input"
          />
        )}
      </Field>
      <SubmitButton pendingLabel="Joining…" className="btn-primary w-full">
        Join the lab
      </SubmitButton>
    </form>
  );
}
