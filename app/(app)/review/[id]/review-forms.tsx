"use client";
import { useActionState } from "react";
import { initialActionState, type ActionState } from "@/lib/contract/action-state";
import { SIGNATURE_MEANING_LABELS, SIGNATURE_MEANINGS } from "@/lib/contract/vocabulary";

type Action = (prev: ActionState, form: FormData) => Promise<ActionState>;

function FieldError({ id, errors }: { id: string; errors?: string[] }) {
  return errors?.length ? (
    <p id={id} role="alert" className="mt-1 text-xs text-red-700">
      {errors.join(" ")}
    </p>
  ) : null;
}

/** Countersign with the password and a chosen meaning, or return with a comment. */
export function ReviewForms(props: {
  entryId: string;
  revision: number;
  countersign: Action;
  returnEntry: Action;
}) {
  const [signState, signAction, signing] = useActionState(props.countersign, initialActionState);
  const [returnState, returnAction, returning] = useActionState(
    props.returnEntry,
    initialActionState,
  );
  return (
    <div className="space-y-5">
      <form action={signAction} className="space-y-3 card p-4" aria-label="Countersign">
        <h2 className="text-base font-semibold">Countersign revision {props.revision}</h2>
        <input type="hidden" name="entryId" value={props.entryId} />
        <input type="hidden" name="revision" value={props.revision} />
        <fieldset className="space-y-1.5 text-sm">
          <legend className="mb-1 label">Meaning of your signature</legend>
          {SIGNATURE_MEANINGS.map((m) => (
            <label key={m} className="flex items-start gap-2">
              <input
                type="radio"
                name="meaning"
                value={m}
                defaultChecked={(signState.values?.meaning ?? SIGNATURE_MEANINGS[0]) === m}
                className="mt-1"
              />
              <span>{SIGNATURE_MEANING_LABELS[m]}</span>
            </label>
          ))}
        </fieldset>
        <label className="block text-sm">
          <span className="mb-1 label">Comment (optional)</span>
          <textarea
            name="comment"
            rows={2}
            className="input"
            defaultValue={signState.values?.comment ?? ""}
          />
        </label>
        <label className="block text-sm">
          <span className="mb-1 label">Your password</span>
          <input
            type="password"
            name="password"
            autoComplete="current-password"
            required
            className="input"
            aria-invalid={Boolean(signState.fieldErrors?.password)}
            aria-describedby={signState.fieldErrors?.password ? "password-error" : undefined}
          />
        </label>
        <FieldError id="password-error" errors={signState.fieldErrors?.password} />
        <p className="text-xs text-ink-soft">
          Your name, the meaning, the time and the SHA-256 of this revision&apos;s content are
          recorded. After signing, the revision can never change.
        </p>
        <button type="submit" className="btn-primary w-full" disabled={signing}>
          {signing ? "Signing…" : "Countersign"}
        </button>
        {signState.message && !signState.ok ? (
          <p role="alert" className="text-sm text-red-700">
            {signState.message}
          </p>
        ) : null}
      </form>
      <form action={returnAction} className="space-y-3 card p-4" aria-label="Return to the author">
        <h2 className="text-base font-semibold">Return to the author</h2>
        <input type="hidden" name="entryId" value={props.entryId} />
        <input type="hidden" name="revision" value={props.revision} />
        <label className="block text-sm">
          <span className="mb-1 label">What should change</span>
          <textarea
            name="comment"
            rows={3}
            required
            className="input"
            defaultValue={returnState.values?.comment ?? ""}
            aria-invalid={Boolean(returnState.fieldErrors?.comment)}
            aria-describedby={returnState.fieldErrors?.comment ? "return-comment-error" : undefined}
          />
        </label>
        <FieldError id="return-comment-error" errors={returnState.fieldErrors?.comment} />
        <button type="submit" className="btn-quiet w-full" disabled={returning}>
          Return with this comment
        </button>
        {returnState.message && !returnState.ok ? (
          <p role="alert" className="text-sm text-red-700">
            {returnState.message}
          </p>
        ) : null}
      </form>
    </div>
  );
}
