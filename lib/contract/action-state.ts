import type { FieldErrors } from "@/lib/errors";

/** What every form's server action returns to `useActionState` (shared by client and server). */
export interface ActionState {
  ok: boolean;
  message?: string;
  fieldErrors?: FieldErrors;
  values?: Record<string, string>;
}

export const initialActionState: ActionState = { ok: false };
