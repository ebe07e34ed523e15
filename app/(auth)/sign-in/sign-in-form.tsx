"use client";
import { useActionState } from "react";
import { Field } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { SubmitButton } from "@/components/ui/submit-button";
import { initialActionState } from "@/lib/contract/action-state";
import { signInAction } from "./actions";

export function SignInForm({ next }: { next?: string }) {
  const [state, formAction] = useActionState(signInAction, initialActionState);
  return (
    <form action={formAction} className="space-y-4" noValidate>
      <input type="hidden" name="next" value={next ?? "/"} />
      <FormMessage message={state.message} />
      <Field id="email" label="E-mail" errors={state.fieldErrors?.email}>
        {(aria) => (
          <input
            {...aria}
            name="email"
            type="email"
            autoComplete="username"
            className="input"
            defaultValue={state.values?.email ?? ""}
            required
          />
        )}
      </Field>
      <Field id="password" label="Password" errors={state.fieldErrors?.password}>
        {(aria) => (
          <input
            {...aria}
            name="password"
            type="password"
            autoComplete="current-password"
            className="input"
            required
          />
        )}
      </Field>
      <SubmitButton pendingLabel="Signing in…" className="btn-primary w-full">
        Sign in
      </SubmitButton>
    </form>
  );
}
