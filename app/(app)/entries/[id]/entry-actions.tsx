"use client";
import { useActionState } from "react";
import { initialActionState, type ActionState } from "@/lib/contract/action-state";

type Action = (prev: ActionState, form: FormData) => Promise<ActionState>;

export function EntryActions(props: {
  entryId: string;
  canSubmit: boolean;
  canArchive: boolean;
  archived: boolean;
  submit: Action;
  archive: Action;
}) {
  const [submitState, submitAction] = useActionState(props.submit, initialActionState);
  const [archiveState, archiveAction] = useActionState(props.archive, initialActionState);
  const message = submitState.message ?? archiveState.message;
  const failed =
    (submitState.message && !submitState.ok) || (archiveState.message && !archiveState.ok);
  return (
    <div className="space-y-2">
      {props.canSubmit ? (
        <form action={submitAction}>
          <input type="hidden" name="entryId" value={props.entryId} />
          <button type="submit" className="btn-primary w-full">
            Submit for countersignature
          </button>
        </form>
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
      {message ? (
        <p
          role={failed ? "alert" : "status"}
          className={`text-xs ${failed ? "text-red-700" : "text-lagoon-700"}`}
        >
          {message}
        </p>
      ) : null}
    </div>
  );
}
