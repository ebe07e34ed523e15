import "server-only";
import { unstable_rethrow } from "next/navigation";
import { isAppError } from "@/lib/errors";
import type { ActionState } from "@/lib/contract/action-state";

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
    if (isAppError(error))
      return { ok: false, message: error.message, fieldErrors: error.fieldErrors, values };
    console.error("[ionleaf] action failed", error);
    return {
      ok: false,
      message: "Something went wrong on our side. Nothing was saved; please try again.",
      values,
    };
  }
}
