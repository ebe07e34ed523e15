"use client";
import { useActionState, useState } from "react";
import { initialActionState, type ActionState } from "@/lib/contract/action-state";

type Action = (prev: ActionState, form: FormData) => Promise<ActionState>;

function Message({ state }: { state: ActionState }) {
  if (!state.message) return null;
  return (
    <p
      role={state.ok ? "status" : "alert"}
      className={`text-xs ${state.ok ? "text-lagoon-700" : "text-red-700"}`}
    >
      {state.message}
    </p>
  );
}

/** The author's and admin's actions on the entry page, as the entry rules allow them. */
export function EntryActions(props: {
  entryId: string;
  canSubmit: boolean;
  canArchive: boolean;
  canAmend: boolean;
  archived: boolean;
  reviewers: { id: string; name: string }[];
  submit: Action;
  archive: Action;
  amend: Action;
}) {
  const [submitState, submitAction, submitting] = useActionState(props.submit, initialActionState);
  const [archiveState, archiveAction] = useActionState(props.archive, initialActionState);
  const [amendState, amendAction, amending] = useActionState(props.amend, initialActionState);
  const [amendOpen, setAmendOpen] = useState(false);
  return (
    <div className="space-y-3">
      {props.canSubmit ? (
        <form action={submitAction} className="space-y-2" aria-label="Submit for countersignature">
          <input type="hidden" name="entryId" value={props.entryId} />
          <label className="block text-xs">
            <span className="mb-1 label">Reviewer</span>
            <select name="reviewerId" className="input" defaultValue="">
              <option value="">Any supervisor of the lab</option>
              {props.reviewers.map((r) => (
                <option key={r.id} value={r.id}>
                  {r.name}
                </option>
              ))}
            </select>
          </label>
          {submitState.fieldErrors?.reviewerId ? (
            <p role="alert" className="text-xs text-red-700">
              {submitState.fieldErrors.reviewerId.join(" ")}
            </p>
          ) : null}
          <button type="submit" className="btn-primary w-full" disabled={submitting}>
            Submit for countersignature
          </button>
        </form>
      ) : null}
      {props.canAmend ? (
        amendOpen ? (
          <form
            action={amendAction}
            className="space-y-2"
            aria-label="Amend the countersigned entry"
          >
            <input type="hidden" name="entryId" value={props.entryId} />
            <label className="block text-xs">
              <span className="mb-1 label">Reason for the amendment</span>
              <textarea
                name="reason"
                required
                rows={3}
                className="input"
                defaultValue={amendState.values?.reason ?? ""}
                aria-invalid={Boolean(amendState.fieldErrors?.reason)}
                aria-describedby={amendState.fieldErrors?.reason ? "amend-reason-error" : undefined}
              />
            </label>
            {amendState.fieldErrors?.reason ? (
              <p id="amend-reason-error" role="alert" className="text-xs text-red-700">
                {amendState.fieldErrors.reason.join(" ")}
              </p>
            ) : null}
            <p className="text-xs text-ink-soft">
              The countersigned revision stays as it is. Your changes become new revisions marked as
              this amendment, which needs its own countersignature.
            </p>
            <div className="flex gap-2">
              <button type="submit" className="btn-primary flex-1" disabled={amending}>
                Start amendment
              </button>
              <button type="button" className="btn-quiet" onClick={() => setAmendOpen(false)}>
                Cancel
              </button>
            </div>
          </form>
        ) : (
          <button type="button" className="btn-quiet w-full" onClick={() => setAmendOpen(true)}>
            Amend…
          </button>
        )
      ) : null}
      {props.canArchive ? (
        <form action={archiveAction}>
          <input type="hidden" name="entryId" value={props.entryId} />
          <input type="hidden" name="archived" value={props.archived ? "false" : "true"} />
          <button type="submit" className="btn-quiet w-full">
            {props.archived ? "Restore from archive" : "Archive entry"}
          </button>
        </form>
      ) : null}
      {/* Outside the forms: an action that succeeds can remove its own form (a submitted
          entry has no submit button), and its message must stay. */}
      <Message state={submitState} />
      <Message state={amendState} />
      <Message state={archiveState} />
    </div>
  );
}
