import "server-only";
import { unstable_rethrow } from "next/navigation";
import { isAppError } from "@/lib/errors";
import { appErrorFromDatabase } from "@/lib/errors/database";
import type { ActionState } from "@/lib/contract/action-state";
import { formDataToObject } from "@/lib/validation/parse";

export type { ActionState } from "@/lib/contract/action-state";

/**
 * Runs a server action body and shapes its failure for the form: AppErrors become field
 * errors or a message; anything else is logged and reported without internals. Next.js
 * redirects and not-found signals pass through.
 */
export async function runAction(
  body: () => Promise<ActionState | void>,
  values?: Record<string, string>,
): Promise<ActionState> {
  try {
    return (await body()) ?? { ok: true };
  } catch (error) {
    unstable_rethrow(error);
    const known = isAppError(error) ? error : appErrorFromDatabase(error);
    if (known) return { ok: false, message: known.message, fieldErrors: known.fieldErrors, values };
    console.error("[ionleaf] action failed", error);
    return {
      ok: false,
      message: "Something went wrong on our side. Nothing was saved; please try again.",
      values,
    };
  }
}

/**
 * A server action fed by a form: the form's text is read and checked first (lib/validation),
 * and a refused field (a NUL byte, a lone surrogate, an oversized value) comes back as a
 * field error like any other. `echo` picks the values sent back to refill the form — never
 * a password.
 */
export async function runFormAction(
  form: FormData,
  body: (values: Record<string, string>) => Promise<ActionState | void>,
  echo: (values: Record<string, string>) => Record<string, string> | undefined = () => undefined,
): Promise<ActionState> {
  let values: Record<string, string>;
  try {
    values = formDataToObject(form);
  } catch (error) {
    return runAction(() => {
      throw error;
    });
  }
  return runAction(() => body(values), echo(values));
}
