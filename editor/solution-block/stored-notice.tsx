import type { StoredSolution } from "@/lib/document/stored-evaluation";

const when = (iso: string) =>
  new Date(iso).toLocaleString("en-GB", {
    dateStyle: "medium",
    timeStyle: "short",
    timeZone: "UTC",
  });

/** Says that the numbers below are the stored ones, and where today's engine would differ. */
export function StoredNotice({
  stored,
  engineChanges,
}: {
  stored: StoredSolution;
  engineChanges: string[];
}) {
  return (
    <div className="rounded-md border border-ink/10 bg-paper px-3 py-2 text-xs text-ink-soft">
      <p data-testid="stored-notice">
        Numbers as computed when this revision was saved: engine {stored.engineVersion},{" "}
        {when(stored.computedAt)} UTC.
      </p>
      {engineChanges.length > 0 ? (
        <p className="mt-1 text-amber-800" data-testid="engine-changes">
          Today&apos;s engine gives other numbers: {engineChanges.join("; ")}. The stored numbers
          above are the record.
        </p>
      ) : null}
    </div>
  );
}
