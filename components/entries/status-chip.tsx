import { ENTRY_STATUS_LABELS, type EntryStatus } from "@/lib/contract/vocabulary";

const TONES: Record<EntryStatus, string> = {
  draft: "bg-ink/5 text-ink-soft",
  submitted: "bg-copper-50 text-copper-700",
  countersigned: "bg-lagoon-50 text-lagoon-700",
  returned: "bg-amber-50 text-amber-800",
  amended: "bg-amber-50 text-amber-800",
};

export function StatusChip({ status }: { status: EntryStatus }) {
  return (
    <span className={`chip ${TONES[status]}`} data-status={status}>
      {ENTRY_STATUS_LABELS[status]}
    </span>
  );
}
