import type { RevisionComparison } from "@/lib/document/review-diff";

const STATUS: Record<string, string> = {
  added: "bg-lagoon-50 text-lagoon-700",
  removed: "bg-red-50 text-red-800",
  changed: "bg-amber-50 text-amber-800",
  unchanged: "bg-ink/5 text-ink-soft",
};

/** Column headings of the comparison: a review compares the signed revision with the submitted one. */
const REVIEW_LABELS = { before: "Signed before", after: "Submitted now" };

function ValueTable({
  caption,
  rows,
  labels,
}: {
  caption: string;
  rows: RevisionComparison["blocks"][number]["inputs"];
  labels: { before: string; after: string };
}) {
  if (rows.length === 0) return null;
  return (
    <table className="w-full text-xs">
      <caption className="py-1 text-left font-medium text-ink-soft">{caption}</caption>
      <thead>
        <tr className="text-left text-ink-soft">
          <th scope="col" className="py-1 pr-3 font-normal">
            Field
          </th>
          <th scope="col" className="py-1 pr-3 font-normal">
            {labels.before}
          </th>
          <th scope="col" className="py-1 font-normal">
            {labels.after}
          </th>
        </tr>
      </thead>
      <tbody>
        {rows.map((r) => (
          <tr
            key={r.label}
            className={r.changed ? "bg-amber-50/70" : ""}
            data-changed={r.changed || undefined}
          >
            <th scope="row" className="py-1 pr-3 text-left font-normal text-ink-soft">
              {r.label}
            </th>
            <td className={`py-1 pr-3 font-mono ${r.changed ? "text-red-800 line-through" : ""}`}>
              {r.before ?? "—"}
            </td>
            <td className={`py-1 font-mono ${r.changed ? "font-semibold text-ink" : ""}`}>
              {r.after ?? "—"}
            </td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}

/** The reviewer's view of what changed: text word by word, every block's inputs and results. */
export function RevisionComparisonView({
  comparison,
  baselineRevision,
  heading,
  labels = REVIEW_LABELS,
}: {
  comparison: RevisionComparison;
  baselineRevision: number | null;
  /** Another heading than the review's ("What changed since countersigned revision n"). */
  heading?: string;
  labels?: { before: string; after: string };
}) {
  return (
    <section aria-labelledby="changes-heading" className="space-y-4 card p-5">
      <h2 id="changes-heading" className="text-base font-semibold">
        {heading ??
          (baselineRevision === null
            ? "Content under review (nothing countersigned before)"
            : `What changed since countersigned revision ${baselineRevision}`)}
      </h2>
      {comparison.title.changed && comparison.title.before !== null ? (
        <p className="text-sm">
          Title: <del className="text-red-800">{comparison.title.before}</del> →{" "}
          <ins className="font-medium text-lagoon-700 no-underline">{comparison.title.after}</ins>
        </p>
      ) : null}
      <div>
        <h3 className="mb-1 text-sm font-medium">Text</h3>
        {comparison.textChanged || baselineRevision === null ? (
          <p className="rounded-md border border-ink/10 bg-paper px-3 py-2 text-sm whitespace-pre-wrap">
            {comparison.text.map((part, i) =>
              part.change === "added" ? (
                <ins key={i} className="bg-lagoon-50 text-lagoon-700">
                  {part.value}
                </ins>
              ) : part.change === "removed" ? (
                <del key={i} className="bg-red-50 text-red-800">
                  {part.value}
                </del>
              ) : (
                <span key={i}>{part.value}</span>
              ),
            )}
          </p>
        ) : (
          <p className="text-sm text-ink-soft">No change to the text.</p>
        )}
      </div>
      {comparison.blocks.map((block) => (
        <div
          key={block.blockId}
          className="space-y-2 rounded-md border border-ink/10 p-3"
          data-testid={`block-diff-${block.blockId}`}
        >
          <p className="flex items-center gap-2 text-sm">
            <span className="font-medium">
              {block.kind === "solution" ? "Solution block" : "Cell block"} “{block.name}”
            </span>
            <span className={`chip ${STATUS[block.status]}`}>{block.status}</span>
          </p>
          {block.status !== "unchanged" ? (
            <div className="grid gap-3 overflow-x-auto lg:grid-cols-2">
              <ValueTable caption="Inputs" rows={block.inputs} labels={labels} />
              <ValueTable
                caption="Results computed by the server"
                rows={block.results}
                labels={labels}
              />
            </div>
          ) : null}
        </div>
      ))}
    </section>
  );
}
