import "server-only";
import type { NewerStock } from "@/lib/contract/lineage";
import { findRevision, updateEntry } from "@/db/queries/entries";
import { insertAuditEvent } from "@/db/queries/audit";
import {
  findBlockChangeRevision,
  findRevisionsMeta,
  findStockResults,
  listCurrentStockLinks,
  listStockUses,
} from "@/db/queries/lineage";
import type { SaveResult } from "@/lib/contract/entries";
import { moveStockRevision, type StockLookup } from "@/lib/document/dilution";
import { prepareRevision } from "@/lib/document/prepare-revision";
import { AppError } from "@/lib/errors";
import { assertCan, type Actor } from "@/lib/rules/authorize";
import { assertEntryAllows, entryFactsOf } from "@/lib/rules/entry-rules";
import { getDb } from "@/lib/server/database";
import { stockQuerySchema, updateStockSchema } from "@/lib/validation/lineage";
import { parseInput } from "@/lib/validation/parse";
import { loadEntryFor } from "../entry-access";
import { writeRevision } from "../save-entry";
import { lookupOf } from "./resolve-stocks";

/**
 * The stored composition of one solution block of the lab, at a revision (default: the entry's
 * current one), for the editor to show a dilution live. The same reading the server does on
 * save (lookupOf), so the editor and the stored result agree. Another lab's entry: 404.
 */
export async function getStockComposition(actor: Actor, raw: unknown): Promise<StockLookup> {
  assertCan(actor, "solution.search");
  const q = parseInput(stockQuerySchema, raw);
  const db = getDb();
  const entry = await loadEntryFor(db, actor, q.entry, "view");
  const revision = q.revision ?? entry.currentRevisionNumber;
  const [row] =
    revision >= 1
      ? await findStockResults(db, actor.labId, [{ entryId: entry.id, blockId: q.block, revision }])
      : [];
  if (!row) throw new AppError("not_found", "That revision shows no such solution block.");
  return lookupOf(row);
}

/** The lab's stock list: every solution block used as a stock, and every use of it. */
export async function listLabStocks(actor: Actor) {
  assertCan(actor, "entry.read");
  const rows = await listStockUses(getDb(), actor.labId);
  const stocks = new Map<
    string,
    {
      entryId: string;
      entryTitle: string;
      blockId: string;
      href: string;
      name: string;
      species: string[];
      /** The engine's hazard notes for the stock's species (lib/chem's hazard table). */
      hazards: string[];
      currentRevision: number;
      made: { revision: number; byName: string; at: string; href: string }[];
      uses: {
        entryId: string;
        entryTitle: string;
        blockId: string;
        href: string;
        fromRevision: number;
        toRevision: number | null;
        stockRevision: number;
        volumeMl: number;
        finalVolumeMl: number;
      }[];
    }
  >();
  for (const r of rows) {
    const key = `${r.parentEntryId}/${r.parentBlockId}`;
    let stock = stocks.get(key);
    if (!stock) {
      stock = {
        entryId: r.parentEntryId,
        entryTitle: r.parentEntryTitle,
        blockId: r.parentBlockId,
        href: `/entries/${r.parentEntryId}#block-${encodeURIComponent(r.parentBlockId)}`,
        name: r.stockName,
        species: r.stockSpecies,
        hazards: Array.isArray(r.stockHazards) ? r.stockHazards : [],
        currentRevision: r.parentCurrentRevision,
        made: [],
        uses: [],
      };
      stocks.set(key, stock);
    }
    if (!stock.made.some((m) => m.revision === r.parentRevision))
      stock.made.push({
        revision: r.parentRevision,
        byName: r.madeByName,
        at: r.madeAt.toISOString(),
        href: `/entries/${r.parentEntryId}/revisions/${r.parentRevision}#block-${encodeURIComponent(r.parentBlockId)}`,
      });
    stock.uses.push({
      entryId: r.childEntryId,
      entryTitle: r.childEntryTitle,
      blockId: r.childBlockId,
      href: `/entries/${r.childEntryId}#block-${encodeURIComponent(r.childBlockId)}`,
      fromRevision: r.childFromRevision,
      toRevision: r.childToRevision,
      stockRevision: r.parentRevision,
      volumeMl: r.volumeMl,
      finalVolumeMl: r.finalVolumeMl,
    });
  }
  return [...stocks.values()];
}

/**
 * The stocks of the entry's current solution blocks whose own entry has a newer revision in
 * which the stock block changed (or left): what the entry page's notice offers to update.
 */
export async function newerStocksOf(actor: Actor, entryId: string): Promise<NewerStock[]> {
  assertCan(actor, "entry.read");
  const db = getDb();
  const entry = await loadEntryFor(db, actor, entryId, "view");
  const links = await listCurrentStockLinks(db, actor.labId, entry.id);
  const out: NewerStock[] = [];
  for (const l of links) {
    if (l.parentCurrentRevision <= l.parentRevision) continue;
    if (l.parentCurrentResultId === l.parentResultId) continue;
    if (
      out.some(
        (o) =>
          o.blockId === l.blockId &&
          o.parentEntryId === l.parentEntryId &&
          o.parentBlockId === l.parentBlockId,
      )
    )
      continue;
    const changedIn = await findBlockChangeRevision(
      db,
      actor.labId,
      l.parentEntryId,
      l.parentBlockId,
      l.parentRevision,
    );
    const [meta] = await findRevisionsMeta(db, actor.labId, l.parentEntryId, [
      l.parentCurrentRevision,
    ]);
    out.push({
      blockId: l.blockId,
      blockName: l.childBlockName,
      parentEntryId: l.parentEntryId,
      parentEntryTitle: l.parentEntryTitle,
      parentBlockId: l.parentBlockId,
      stockName: l.parentCurrentName ?? "",
      usedRevision: l.parentRevision,
      currentRevision: l.parentCurrentRevision,
      changedInRevision: changedIn,
      amendmentReason: meta?.amendmentReason ?? null,
      removed: l.parentCurrentResultId === null,
      diffHref: `/entries/${l.parentEntryId}/revisions/compare?from=${l.parentRevision}&to=${l.parentCurrentRevision}`,
    });
  }
  return out;
}

/**
 * "Use the newer revision of this stock": a new revision of the entry in which the block names
 * the stock's newer revision, through the normal save (stale base revision 409, stocks
 * resolved and recomputed on the server). A countersigned entry becomes an amendment with the
 * reason given; a submitted one is refused by the entry rules. Never a silent change.
 */
export async function updateStock(
  actor: Actor,
  entryId: string,
  raw: unknown,
): Promise<SaveResult> {
  assertCan(actor, "entry.write");
  const input = parseInput(updateStockSchema, raw);
  return getDb().transaction(async (tx) => {
    let entry = await loadEntryFor(tx, actor, entryId, "view", { forUpdate: true });
    const amend = entry.status === "countersigned";
    assertEntryAllows(actor, entryFactsOf(entry), amend ? "amend" : "edit");
    const current = await findRevision(tx, entry.id, entry.currentRevisionNumber);
    if (!current) throw new AppError("conflict", "Save the entry first.");
    const { content, moved } = moveStockRevision(current.revision.content, input);
    if (moved === 0)
      throw new AppError("invalid_input", "This solution block does not use that stock.", {
        fieldErrors: { parentBlockId: ["This solution block does not use that stock."] },
      });
    if (amend) {
      if (!input.reason || input.reason.length < 3)
        throw new AppError("invalid_input", "Some fields need attention.", {
          fieldErrors: {
            reason: ["The entry is countersigned: give the reason for the amendment."],
          },
        });
      await updateEntry(tx, actor.labId, entry.id, {
        status: "amended",
        amendmentReason: input.reason,
        updatedAt: new Date(),
      });
      await insertAuditEvent(tx, {
        labId: actor.labId,
        actorId: actor.userId,
        action: "entry.amendment_started",
        targetType: "entry",
        targetId: entry.id,
        details: { signedRevision: entry.signedRevisionNumber, reason: input.reason },
      });
      entry = { ...entry, status: "amended", amendmentReason: input.reason };
    }
    const prepared = prepareRevision(current.revision.title, content);
    const saved = await writeRevision(tx, actor, entry, input.baseRevision, prepared);
    await insertAuditEvent(tx, {
      labId: actor.labId,
      actorId: actor.userId,
      action: "entry.stock_updated",
      targetType: "entry",
      targetId: entry.id,
      details: {
        revision: saved.revision,
        blockId: input.blockId,
        stock: { entryId: input.parentEntryId, blockId: input.parentBlockId },
        toRevision: input.toRevision,
      },
    });
    return saved;
  });
}
