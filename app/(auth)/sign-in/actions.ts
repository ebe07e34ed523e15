"use server";
import { AuthError, CredentialsSignin } from "next-auth";
import { signIn } from "@/lib/auth";
import { fieldErrorsFromZod, isAppError } from "@/lib/errors";
import type { ActionState } from "@/lib/http/action";
import { signInSchema } from "@/lib/validation/auth";
import { formDataToObject } from "@/lib/validation/parse";

function safeNext(value: string | undefined): string {
  // Only same-site paths: an open redirect after sign-in would be a phishing aid.
  return value && value.startsWith("/") && !value.startsWith("//") ? value : "/";
}

export async function signInAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  let values: Record<string, string>;
  try {
    values = formDataToObject(form);
  } catch (error) {
    if (isAppError(error))
      return { ok: false, message: error.message, fieldErrors: error.fieldErrors };
    throw error;
  }
  const parsed = signInSchema.safeParse(values);
  if (!parsed.success)
    return {
      ok: false,
      fieldErrors: fieldErrorsFromZod(parsed.error.issues),
      values: { email: values.email ?? "" },
    };
  try {
    await signIn("credentials", { ...parsed.data, redirectTo: safeNext(values.next) });
    return { ok: true };
  } catch (error) {
    if (error instanceof CredentialsSignin && error.code.startsWith("throttled")) {
      const seconds = Number(error.code.split(":")[1] ?? 900);
      const minutes = Math.max(1, Math.ceil(seconds / 60));
      return {
        ok: false,
        message: `Too many failed attempts for this address. Try again in ${minutes} minute${minutes === 1 ? "" : "s"}.`,
        values: { email: parsed.data.email },
      };
    }
    if (error instanceof AuthError) {
      return {
        ok: false,
        message: "That e-mail and password do not match an active account.",
        values: { email: parsed.data.email },
      };
    }
    throw error; // NEXT_REDIRECT on success, and real failures, go on to Next.js
  }
}
