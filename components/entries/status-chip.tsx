const TONES: Record<string, string> = {
  draft: "bg-ink/5 text-ink-soft",
  submitted: "bg-copper-50 text-copper-700",
  countersigned: "bg-lagoon-50 text-lagoon-700",
  returned: "bg-amber-50 text-amber-800",
};

export function StatusChip({ status }: { status: string }) {
  return (
    <span className={`chip ${TONES[status] ?? TONES.draft}`} data-status={status}>
      {status}
    </span>
  );
}
