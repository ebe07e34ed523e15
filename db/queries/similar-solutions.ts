import { sql } from "drizzle-orm";
import type { Executor } from "../client";

/** What the composition distance needs of a solution (lib/finder/composition-distance.ts). */
export type SolutionPoint = {
  id: string;
  entryId: string;
  blockId: string;
  name: string;
  temperatureC: number;
  solvent: string;
  ionicStrengthMolal: number | null;
  /** Molality (mol/kg) of each ion. */
  composition: Record<string, number>;
};

const POINT_COLUMNS = sql`
  b.id, b.entry_id as "entryId", b.block_id as "blockId", b.name, b.temperature_c as "temperatureC",
  b.solvent, b.ionic_strength_molal as "ionicStrengthMolal", r.composition`;

/**
 * A solution block of an entry of the lab: as it stands now, or as it stood in `revision`
 * (the block row whose interval covers it). Null when there is no such block.
 */
export async function findBlockPoint(
  db: Executor,
  labId: string,
  entryId: string,
  blockId: string,
  revision?: number,
): Promise<SolutionPoint | null> {
  const when =
    revision === undefined
      ? sql`b.to_revision is null`
      : sql`b.from_revision <= ${revision} and (b.to_revision is null or b.to_revision > ${revision})`;
  const result = await db.execute<SolutionPoint>(sql`
    select ${POINT_COLUMNS}
      from block_results b join solution_results r on r.id = b.result_id
     where b.lab_id = ${labId} and b.entry_id = ${entryId} and b.block_id = ${blockId} and ${when}
     limit 1`);
  return result.rows[0] ?? null;
}

/**
 * Candidates for "similar solutions": current solutions of the lab in entries that are not
 * archived, other than the target's own block, found through the covering ionic-strength
 * index from both sides of the target's ionic strength: the nearest `perSide` that share at
 * least one of its ions, and the nearest `perSide / 4` that contain all of them (so that the
 * same recipe made ten times stronger is still a candidate). The distance then ranks them.
 */
export async function findSimilarCandidates(
  db: Executor,
  labId: string,
  target: { entryId: string; blockId: string; ionicStrengthMolal: number; ions: string[] },
  perSide: number,
): Promise<SolutionPoint[]> {
  const ions = sql`${sql.param(target.ions)}::text[]`;
  const base = sql`b.lab_id = ${labId} and b.to_revision is null
    and not (b.entry_id = ${target.entryId} and b.block_id = ${target.blockId})
    and not exists (select 1 from entries xa where xa.id = b.entry_id and xa.archived_at is not null)`;
  const I = target.ionicStrengthMolal;
  const side = (op: "share" | "contain", up: boolean, limit: number) =>
    sql`(select b.id from block_results b where ${base}
          and b.ionic_strength_molal ${sql.raw(up ? ">=" : "<")} ${I}
          and b.species ${sql.raw(op === "share" ? "&&" : "@>")} ${ions}
        order by b.ionic_strength_molal ${sql.raw(up ? "asc" : "desc")} limit ${limit})`;
  const few = Math.max(1, Math.floor(perSide / 4));
  const result = await db.execute<SolutionPoint>(sql`
    select ${POINT_COLUMNS}
      from (select distinct id from (
              ${side("share", true, perSide)} union all ${side("share", false, perSide)}
              union all ${side("contain", true, few)} union all ${side("contain", false, few)}
            ) c) c
      join block_results b on b.id = c.id
      join solution_results r on r.id = b.result_id
     where b.lab_id = ${labId}`);
  return result.rows;
}
