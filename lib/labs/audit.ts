import "server-only";
import Papa from "papaparse";
import {
  auditBatchBefore,
  listAuditActions,
  listAuditEvents,
  searchAuditEvents,
  type AuditFilter,
} from "@/db/queries/audit";
import { assertCan, type Actor } from "@/lib/rules/authorize";
import { getDb } from "@/lib/server/database";
import { auditQuerySchema } from "@/lib/validation/audit";
import { parseInput } from "@/lib/validation/parse";

const PAGE_SIZE = 50;
const DAY_MS = 86_400_000;

export async function listRecentAudit(actor: Actor, limit = 30) {
  assertCan(actor, "audit.read");
  return listAuditEvents(getDb(), actor.labId, limit);
}

function filterOf(actor: Actor, raw: unknown): { filter: AuditFilter; page: number } {
  const q = parseInput(auditQuerySchema, raw);
  return {
    page: q.page,
    filter: {
      labId: actor.labId,
      actorId: q.actor,
      action: q.action,
      entryId: q.entry,
      from: q.from ? new Date(`${q.from}T00:00:00Z`) : undefined,
      // "to" is a whole day: events before the next midnight (UTC).
      to: q.to ? new Date(new Date(`${q.to}T00:00:00Z`).getTime() + DAY_MS) : undefined,
    },
  };
}

const toDto = (r: Awaited<ReturnType<typeof auditBatchBefore>>[number]) => ({
  id: r.id,
  at: r.at.toISOString(),
  action: r.action,
  targetType: r.targetType,
  targetId: r.targetId,
  actorName: r.actorName ?? "system",
  actorEmail: r.actorEmail ?? "",
  details: r.details,
});

/** One page of the lab's audit trail under the given filters (admins only). */
export async function searchAudit(actor: Actor, raw: unknown) {
  assertCan(actor, "audit.read");
  const { filter, page } = filterOf(actor, raw);
  const db = getDb();
  const [{ rows, total }, actions] = await Promise.all([
    searchAuditEvents(db, filter, PAGE_SIZE, (page - 1) * PAGE_SIZE),
    listAuditActions(db, actor.labId),
  ]);
  return {
    events: rows.map(toDto),
    total,
    page,
    pages: Math.max(1, Math.ceil(total / PAGE_SIZE)),
    pageSize: PAGE_SIZE,
    actions,
  };
}

/**
 * The whole filtered trail as CSV, streamed in batches of 500 rows (keyset paging), never
 * built in memory. Validation and the permission check happen before the first byte.
 */
export function auditCsvStream(actor: Actor, raw: unknown): ReadableStream<Uint8Array> {
  assertCan(actor, "audit.read");
  const { filter } = filterOf(actor, raw);
  const encoder = new TextEncoder();
  let before: number | null = null;
  let headerSent = false;
  return new ReadableStream<Uint8Array>({
    async pull(controller) {
      if (!headerSent) {
        headerSent = true;
        controller.enqueue(
          encoder.encode("at,actor,actor_email,action,target_type,target_id,details\r\n"),
        );
      }
      const batch = await auditBatchBefore(getDb(), filter, before, 500);
      if (batch.length === 0) {
        controller.close();
        return;
      }
      before = batch[batch.length - 1].id;
      const csv = Papa.unparse(
        batch.map((r) => {
          const d = toDto(r);
          return [
            d.at,
            d.actorName,
            d.actorEmail,
            d.action,
            d.targetType,
            d.targetId ?? "",
            JSON.stringify(d.details),
          ];
        }),
        { newline: "\r\n", escapeFormulae: true },
      );
      controller.enqueue(encoder.encode(`${csv}\r\n`));
    },
  });
}
