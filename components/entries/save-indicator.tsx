import type { AutosaveState } from "./use-autosave";

const LOOK: Record<AutosaveState["status"], { label: string; dot: string }> = {
  saved: { label: "Saved", dot: "bg-lagoon-500" },
  unsaved: { label: "Unsaved changes", dot: "bg-copper-300" },
  saving: { label: "Saving…", dot: "bg-copper-500 animate-pulse" },
  offline: { label: "Offline — kept in this browser", dot: "bg-amber-500" },
  conflict: { label: "Saved elsewhere", dot: "bg-red-600" },
  refused: { label: "Not saved", dot: "bg-red-600" },
};

export function SaveIndicator({ state }: { state: AutosaveState }) {
  const look = LOOK[state.status];
  return (
    <p
      role="status"
      aria-live="polite"
      className="inline-flex items-center gap-2 text-xs text-ink-soft"
      data-testid="save-status"
      data-status={state.status}
    >
      <span className={`h-2 w-2 rounded-full ${look.dot}`} aria-hidden="true" />
      {look.label}
      <span className="font-mono text-ink-faint tabular">r{state.revision}</span>
    </p>
  );
}
