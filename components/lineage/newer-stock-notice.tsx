"use client";
import Link from "next/link";
import { useActionState } from "react";
import { initialActionState, type ActionState } from "@/lib/contract/action-state";
import type { NewerStock } from "@/lib/contract/lineage";

type Action = (prev: ActionState, form: FormData) => Promise<ActionState>;

/**
 * A solution block of this entry was made from a stock whose entry has a newer revision in
 * which the stock changed. Says so, links to the change, and offers to update: a new revision
 * of this entry (an amendment, with its reason, when the entry is countersigned). Nothing
 * changes without that click.
 */
export function NewerStockNotice({
  entryId,
  revision,
  items,
  canUpdate,
  needsReason,
  whyNot,
  update,
}: {
  entryId: string;
  revision: number;
  items: NewerStock[];
  canUpdate: boolean;
  needsReason: boolean;
  whyNot: string | null;
  update: Action;
}) {
  if (items.length === 0) return null;
  return (
    <section
      aria-label="Newer stock revisions"
      data-testid="newer-stock-notice"
      className="space-y-3 rounded-md border border-amber-300 bg-amber-50 px-4 py-3 text-sm text-amber-950"
    >
      {items.map((item) => (
        <NoticeItem
          key={`${item.blockId}/${item.parentEntryId}/${item.parentBlockId}`}
          entryId={entryId}
          revision={revision}
          item={item}
          canUpdate={canUpdate && !item.removed}
          needsReason={needsReason}
          update={update}
        />
      ))}
      {!canUpdate && whyNot ? <p className="text-xs text-amber-900">{whyNot}</p> : null}
    </section>
  );
}

function NoticeItem({
  entryId,
  revision,
  item,
  canUpdate,
  needsReason,
  update,
}: {
  entryId: string;
  revision: number;
  item: NewerStock;
  canUpdate: boolean;
  needsReason: boolean;
  update: Action;
}) {
  const [state, action, pending] = useActionState(update, initialActionState);
  const stock = item.stockName || "a stock";
  return (
    <div className="space-y-2">
      <p>
        <a className="font-medium underline" href={`#block-${item.blockId}`}>
          {item.blockName || "A solution"}
        </a>{" "}
        was made from “{stock}” in{" "}
        <Link
          className="underline"
          href={`/entries/${item.parentEntryId}#block-${item.parentBlockId}`}
        >
          {item.parentEntryTitle}
        </Link>{" "}
        at revision {item.usedRevision}.{" "}
        {item.removed
          ? `Revision ${item.currentRevision} of that entry no longer has this solution.`
          : `The stock changed in revision ${item.changedInRevision ?? item.currentRevision}; its entry is now at revision ${item.currentRevision}.`}
        {item.amendmentReason
          ? ` Amendment: “${item.amendmentReason}”${/[.!?]$/.test(item.amendmentReason) ? "" : "."}`
          : null}{" "}
        <Link className="font-medium text-copper-700 underline" href={item.diffHref}>
          See what changed
        </Link>
      </p>
      {canUpdate ? (
        <form action={action} className="flex flex-wrap items-end gap-2">
          <input type="hidden" name="entryId" value={entryId} />
          <input type="hidden" name="blockId" value={item.blockId} />
          <input type="hidden" name="parentEntryId" value={item.parentEntryId} />
          <input type="hidden" name="parentBlockId" value={item.parentBlockId} />
          <input type="hidden" name="toRevision" value={item.currentRevision} />
          <input type="hidden" name="baseRevision" value={revision} />
          {needsReason ? (
            <label className="min-w-64 flex-1 text-xs">
              <span className="mb-1 label">Reason for the amendment</span>
              <input
                name="reason"
                required
                minLength={3}
                maxLength={2000}
                className="input"
                defaultValue={state.values?.reason ?? ""}
                placeholder="e.g. stock remade; recompute with its new concentration"
              />
            </label>
          ) : null}
          <button type="submit" className="btn-primary" disabled={pending}>
            {needsReason
              ? `Amend to use revision ${item.currentRevision}`
              : `Update to revision ${item.currentRevision}`}
          </button>
        </form>
      ) : null}
      {state.message ? (
        <p
          role={state.ok ? "status" : "alert"}
          className={state.ok ? "text-lagoon-700" : "text-red-700"}
        >
          {state.message}
          {state.fieldErrors ? ` ${Object.values(state.fieldErrors).flat().join(" ")}` : null}
        </p>
      ) : null}
    </div>
  );
}
