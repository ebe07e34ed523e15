import "server-only";
import type { Executor } from "@/db/client";
import { insertRevision, updateEntry } from "@/db/queries/entries";
import {
  closeBlockRows,
  findResultsByHash,
  insertBlockRows,
  insertResult,
  openBlockRows,
} from "@/db/queries/solutions";
import { insertParentLinks } from "@/db/queries/lineage";
import { hasStocks, stockKey, toMl } from "@/lib/document/dilution";
import type { PreparedRevision } from "@/lib/document/prepare-revision";
import { solutionRecordFor } from "@/lib/document/solution-record";
import { resolveStocks } from "./lineage/resolve-stocks";

export interface NewRevision {
  labId: string;
  entryId: string;
  number: number;
  authorId: string;
  prepared: PreparedRevision;
  /** Set while an amendment of a countersigned revision is in progress. */
  amendment?: { amendsRevisionNumber: number; reason: string } | null;
}

export interface AppendedRevision {
  contentHash: string;
  /** Solution blocks in the document. */
  solutions: number;
  /** Rows written for solutions: block rows opened plus results computed and stored. */
  solutionRowsWritten: number;
  /** Lineage rows written: one per stock of each new or changed block made from stocks. */
  stockLinksWritten: number;
  /** Blocks whose result was computed in this save (new content for this lab and engine). */
  computed: number;
}

/**
 * Writes one immutable revision and moves the entry to it. Solution blocks cost a write only
 * when they are new or changed: an unchanged block keeps its open row; a changed one closes
 * its row at this revision and opens a new one; a removed one is closed. A result is computed
 * (with lib/chem, on the server) only when the lab has none stored for that content and
 * engine version. The caller holds the transaction and has checked who may write against
 * which base revision.
 */
export async function appendRevision(tx: Executor, r: NewRevision): Promise<AppendedRevision> {
  const { prepared } = r;
  await insertRevision(tx, {
    entryId: r.entryId,
    number: r.number,
    title: prepared.title,
    content: prepared.content,
    contentText: prepared.contentText,
    contentHash: prepared.contentHash,
    authorId: r.authorId,
    amendsRevisionNumber: r.amendment?.amendsRevisionNumber ?? null,
    amendmentReason: r.amendment?.reason ?? null,
  });

  const open = new Map(
    (await openBlockRows(tx, r.labId, r.entryId)).map((row) => [row.blockId, row]),
  );
  const changed = prepared.solutionBlocks
    .map((b, position) => ({ ...b, position }))
    .filter((b) => open.get(b.block.blockId)?.inputsHash !== b.inputsHash);
  const present = new Set(prepared.solutionBlocks.map((b) => b.block.blockId));
  const toClose = [...open.values()]
    .filter(
      (row) => !present.has(row.blockId) || changed.some((c) => c.block.blockId === row.blockId),
    )
    .map((row) => row.id);
  await closeBlockRows(tx, r.labId, toClose, r.number);

  // Blocks made from stocks read each stock's stored composition here, in this transaction.
  const stocks = await resolveStocks(
    tx,
    r.labId,
    r.entryId,
    changed.map((c) => c.block),
  );

  const stored = new Map(
    (
      await findResultsByHash(
        tx,
        r.labId,
        changed.map((c) => c.inputsHash),
      )
    ).map((row) => [row.inputsHash, row]),
  );
  let computed = 0;
  const newRows = [];
  for (const c of changed) {
    let result = stored.get(c.inputsHash);
    if (!result) {
      const record = solutionRecordFor(c.block, stocks.lookups);
      result = { id: await insertResult(tx, { labId: r.labId, ...record }), ...record };
      stored.set(c.inputsHash, result);
      computed += 1;
    }
    newRows.push({
      labId: r.labId,
      entryId: r.entryId,
      blockId: c.block.blockId,
      resultId: result.id,
      fromRevision: r.number,
      position: c.position,
      name: result.name,
      temperatureC: result.temperatureC,
      solvent: result.solvent,
      modelUsed: result.modelUsed,
      ionicStrengthMolal: result.ionicStrengthMolal,
      ionicStrengthMolar: result.ionicStrengthMolar,
      debyeLengthNm: result.debyeLengthNm,
      species: result.species,
    });
  }
  const rowIds = await insertBlockRows(tx, newRows);
  const links = changed.flatMap(({ block }) => {
    if (!hasStocks(block.dilution)) return [];
    const { stocks: refs, finalVolume, finalVolumeUnit } = block.dilution;
    const finalVolumeMl = finalVolume === null ? NaN : toMl(finalVolume, finalVolumeUnit);
    return refs.flatMap((ref, position) => {
      const volumeMl = ref.volume === null ? NaN : toMl(ref.volume, ref.volumeUnit);
      // A stock is linked once its volumes make sense; until then the block shows why not.
      if (!(volumeMl > 0 && finalVolumeMl >= volumeMl)) return [];
      return [
        {
          labId: r.labId,
          blockResultId: rowIds.get(block.blockId)!,
          entryId: r.entryId,
          blockId: block.blockId,
          revision: r.number,
          position,
          parentEntryId: ref.entryId,
          parentBlockId: ref.blockId,
          parentRevision: ref.revision,
          parentResultId: stocks.resultIds.get(stockKey(ref))!,
          volumeMl,
          finalVolumeMl,
        },
      ];
    });
  });
  await insertParentLinks(tx, links);

  await updateEntry(tx, r.labId, r.entryId, {
    currentRevisionNumber: r.number,
    title: prepared.title,
    updatedAt: new Date(),
  });
  return {
    contentHash: prepared.contentHash,
    solutions: prepared.solutionBlocks.length,
    solutionRowsWritten: newRows.length + computed,
    stockLinksWritten: links.length,
    computed,
  };
}
