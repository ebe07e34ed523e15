import "server-only";
import type { TraceViewDto } from "@/lib/contract/traces";
import { findLabAttachment, findTraceMapping, saveTraceMapping } from "@/db/queries/attachments";
import { insertAuditEvent } from "@/db/queries/audit";
import { AppError } from "@/lib/errors";
import { loadEntryFor } from "@/lib/notebook/entry-access";
import { assertCan, type Actor } from "@/lib/rules/authorize";
import { getDb } from "@/lib/server/database";
import { getStorage } from "@/lib/storage";
import type { ColumnMapping, TraceSummary } from "@/lib/traces";
import { parseTraceStream } from "@/lib/traces/parse-file";
import { layoutKeyOf } from "./trace-layout";
import { keepPlotView, plotViewOf, readPlotView, type TracePlotView } from "./trace-plot-view";

type TraceView = TraceViewDto;

/** Recent views by content and mapping: reopening an entry does not parse a big file again. */
const cache = new Map<string, TracePlotView>();

async function loadAttachment(actor: Actor, attachmentId: string) {
  assertCan(actor, "entry.read");
  if (!/^[0-9a-f-]{36}$/i.test(attachmentId))
    throw new AppError("not_found", "Attachment not found.");
  const row = await findLabAttachment(getDb(), actor.labId, attachmentId);
  if (!row) throw new AppError("not_found", "Attachment not found.");
  await loadEntryFor(getDb(), actor, row.entryId, "view");
  return row;
}

/**
 * A stored instrument export read back from the storage and turned into plot series and
 * voltammetric peaks. The parse runs on demand; the database holds only the summary.
 * `parse: false` answers null instead of parsing when no view is kept.
 */
async function traceViewOf(
  actor: Actor,
  attachmentId: string,
  given: ColumnMapping | null,
  parse: boolean,
): Promise<TraceView | null> {
  const row = await loadAttachment(actor, attachmentId);
  if (row.kind !== "trace" && row.kind !== "file")
    throw new AppError("invalid_input", "This attachment is not an instrument export.");
  const summary = row.parsedSummary as unknown as TraceSummary | null;
  const saved =
    !given && summary
      ? await findTraceMapping(
          getDb(),
          actor.labId,
          layoutKeyOf(summary.columns.map((c) => c.name)),
        )
      : null;
  const mapping = given ?? (saved?.mapping as ColumnMapping | undefined) ?? null;
  const key = `${row.sha256}:${JSON.stringify(mapping)}`;
  let view = cache.get(key);
  if (!view) {
    // The view kept beside the original at upload (or by an earlier reader); the parse of the
    // whole export runs only when there is none, e.g. for a mapping chosen later.
    const storage = getStorage();
    view = (await readPlotView(storage, row.sha256, mapping)) ?? undefined;
    if (!view) {
      if (!parse) return null;
      view = plotViewOf(
        await parseTraceStream(await storage.read(row.storedPath), mapping ? { mapping } : {}),
        mapping,
      );
      // Keeping it is an optimisation: a failed write only means the next reader parses too.
      await keepPlotView(storage, row.sha256, view).catch(() => undefined);
    }
    cache.set(key, view);
    if (cache.size > 16) cache.delete(cache.keys().next().value!);
  }
  return { attachmentId: row.id, name: row.originalName, ...view };
}

export async function getTraceView(
  actor: Actor,
  attachmentId: string,
  given: ColumnMapping | null = null,
): Promise<TraceView> {
  return (await traceViewOf(actor, attachmentId, given, true))!;
}

/**
 * The views already at hand (kept or cached) of an entry's trace blocks, for the entry page to
 * send with its HTML so the plots draw without another round trip. Never parses: a trace
 * without a kept view, or one this member may not read, is left for the block to fetch.
 */
export async function readyTraceViews(actor: Actor, attachmentIds: string[]): Promise<TraceView[]> {
  const views = await Promise.all(
    [...new Set(attachmentIds)].map((id) => traceViewOf(actor, id, null, false).catch(() => null)),
  );
  return views.filter((v): v is TraceView => v !== null);
}

/** The mapping dialog's answer: remembered for the lab's files with these columns. */
export async function saveTraceMappingFor(
  actor: Actor,
  attachmentId: string,
  mapping: ColumnMapping,
): Promise<TraceView> {
  assertCan(actor, "entry.write");
  const row = await loadAttachment(actor, attachmentId);
  const view = await getTraceView(actor, attachmentId, mapping);
  if (view.summary.points === 0) {
    throw new AppError(
      "invalid_input",
      "With that mapping no row could be read; nothing was saved.",
      {
        details: { problems: view.summary.problems },
      },
    );
  }
  const columns = (
    (row.parsedSummary as unknown as TraceSummary | null)?.columns ?? view.summary.columns
  ).map((c) => c.name);
  await saveTraceMapping(getDb(), {
    labId: actor.labId,
    layoutKey: layoutKeyOf(columns),
    columns,
    mapping: mapping,
    createdById: actor.userId,
  });
  await insertAuditEvent(getDb(), {
    labId: actor.labId,
    actorId: actor.userId,
    action: "trace.mapping_saved",
    targetType: "attachment",
    targetId: row.id,
    details: { columns },
  });
  return view;
}
