export function ConflictPanel(props: {
  onKeepMine: () => void;
  onDiscardMine: () => void;
  choiceFailed?: string;
}) {
  return (
    <div
      role="alertdialog"
      aria-labelledby="conflict-title"
      className="rounded-lg border border-red-200 bg-red-50 p-4 text-sm"
    >
      <p id="conflict-title" className="font-semibold text-red-900">
        This entry was saved elsewhere since you opened it.
      </p>
      <p className="mt-1 text-red-900/80">
        Nothing was overwritten. Your edits are kept in this browser. Choose what happens:
      </p>
      <div className="mt-3 flex flex-wrap gap-2">
        <button type="button" className="btn-primary" onClick={props.onKeepMine}>
          Save my version as the newest revision
        </button>
        <button type="button" className="btn-quiet" onClick={props.onDiscardMine}>
          Discard my edits and load the newer revision
        </button>
      </div>
      {props.choiceFailed ? (
        <p role="alert" className="mt-2 text-xs font-medium text-red-800">
          {props.choiceFailed} Try again when the server answers.
        </p>
      ) : null}
      <p className="mt-2 text-xs text-red-900/70">
        Either way, every earlier revision stays in the history.
      </p>
    </div>
  );
}
