// @vitest-environment node
import { randomUUID } from "node:crypto";
import { sql, type SQL } from "drizzle-orm";
import { PgDialect } from "drizzle-orm/pg-core";
import { Client } from "pg";
import { beforeAll, describe, expect, it } from "vitest";
import { solutionPageSql, type FinderFilter, type FinderSort } from "@/db/queries/solution-finder";
import { getDb } from "@/lib/server/database";
import { seedSyntheticLab } from "@/scripts/seed-synthetic-solutions";
import { ownerDb } from "../support/db";

/**
 * The plans PostgreSQL chooses for the finder's range + species statement. The species index
 * (block_species, one row per species of each current solution) answers it from its covering
 * (lab, species, I) index alone, reading only the rows of that species in the window, for a
 * species in one solution in eight as for one in a thousand. A search that block_species
 * cannot answer (any of several species) reads block_results' covering range index as before.
 * 24 000 current solutions (fewer than ANALYZE's 30 000-row sample, so the statistics and
 * therefore the plans are the same on every run).
 */

interface PlanNode {
  "Node Type": string;
  "Index Name"?: string;
  "Subplan Name"?: string;
  Plans?: PlanNode[];
}

/** The part of the plan that finds the matches: the CTE `m` (the rest reads one page by id). */
function matchesOf(node: PlanNode): PlanNode {
  if (node["Subplan Name"] === "CTE m") return node;
  for (const child of node.Plans ?? []) {
    const found = matchesOf(child);
    if (found["Subplan Name"] === "CTE m") return found;
  }
  return node;
}

function indexesOf(node: PlanNode, out = new Set<string>()): Set<string> {
  if (node["Index Name"]) out.add(node["Index Name"]);
  for (const child of node.Plans ?? []) indexesOf(child, out);
  return out;
}

async function planOf(statement: SQL): Promise<{ indexes: string[]; nodes: string[] }> {
  const result = await getDb().execute<{ "QUERY PLAN": [{ Plan: PlanNode }] }>(
    sql`explain (format json) ${statement}`,
  );
  const root = matchesOf(result.rows[0]["QUERY PLAN"][0].Plan);
  expect(root["Subplan Name"]).toBe("CTE m");
  const nodes: string[] = [];
  const walk = (n: PlanNode) => {
    nodes.push(n["Node Type"]);
    n.Plans?.forEach(walk);
  };
  walk(root);
  return { indexes: [...indexesOf(root)].sort(), nodes };
}

const newest: FinderSort = { column: "saved", direction: "desc" };
const firstPage = { limit: 50, offset: 0 };

describe("the finder's plans at 24 000 current solutions", () => {
  let labId: string;
  const filter = (species: string, scale: "molal" | "molar" = "molal"): FinderFilter => ({
    labId,
    scale,
    ionicStrengthMin: 0.09,
    ionicStrengthMax: 0.11,
    species: [species],
    speciesMatch: "all",
    includeHistory: false,
  });

  beforeAll(async () => {
    const url = new URL(process.env.TEST_SUPERUSER_URL!);
    url.pathname = new URL(process.env.DATABASE_URL!).pathname;
    const superuser = new Client({ connectionString: url.toString() });
    await superuser.connect();
    try {
      await superuser.query("set session_replication_role = replica");
      await superuser.query("begin");
      labId = await seedSyntheticLab(superuser, {
        slug: `plans-${randomUUID().slice(0, 8)}`,
        name: "Synthetic plan-check lab",
        entries: 4_800,
        revisions: 1,
        recipes: 6_000,
        seed: 3,
      });
      await superuser.query("commit");
    } finally {
      await superuser.end();
    }
    // As autovacuum would: statistics, and a visibility map for index-only scans. A first
    // VACUUM right after the load may leave pages not yet all-visible; repeat until it has.
    // Other test files write to the same table while this one runs, so the last few pages
    // may be dirtied again at any moment: 97 % all-visible is what the plans below need (the
    // synthetic lab alone fills several hundred pages), not the whole table.
    let visible = false;
    for (let attempt = 0; attempt < 20 && !visible; attempt++) {
      if (attempt) await new Promise((r) => setTimeout(r, 250)); // an autovacuum may be busy
      // VACUUM is the owner's (the app role would be skipped with a warning).
      await ownerDb().execute(sql`vacuum (freeze, analyze, disable_page_skipping) block_results`);
      await ownerDb().execute(sql`vacuum (freeze, analyze, disable_page_skipping) block_species`);
      await ownerDb().execute(sql`vacuum (analyze) entries`);
      const map = await getDb().execute<{ done: boolean }>(sql`
        select bool_and(relallvisible >= 0.97 * relpages) as done
          from pg_class where relname in ('block_results', 'block_species')`);
      visible = map.rows[0].done;
    }
    const holders = await getDb().execute<{ query: string; state: string }>(sql`
      select left(query, 120) as query, state from pg_stat_activity
       where backend_xmin is not null and pid <> pg_backend_pid()`);
    // A transaction left open elsewhere keeps VACUUM from marking the new rows visible.
    expect({ visible, holders: holders.rows }).toEqual({ visible: true, holders: [] });
  }, 120_000);

  it("has a common species (one in eight) and a rare one (one in a thousand)", async () => {
    const counts = await getDb().execute<{ nacl: number; rbcl: number; all: number }>(sql`
      select count(*) filter (where species @> '{NaCl}')::int as nacl,
             count(*) filter (where species @> '{RbCl}')::int as rbcl, count(*)::int as all
        from block_results where lab_id = ${labId} and to_revision is null`);
    expect(counts.rows[0]).toEqual({ nacl: 2959, rbcl: 24, all: 24_000 });
  });

  it("answers the range + common species query from the species index alone", async () => {
    const plan = await planOf(solutionPageSql(filter("NaCl"), newest, firstPage, 1_000));
    expect(plan.indexes).toEqual(["block_species_molal_idx", "entries_archived_idx"]);
    expect(plan.nodes).toContain("Index Only Scan");
    expect(plan.nodes).not.toContain("Bitmap Index Scan");
  });

  it("answers the range + rare species query from the species index alone", async () => {
    const plan = await planOf(solutionPageSql(filter("RbCl"), newest, firstPage, 1_000));
    expect(plan.indexes).toEqual(["block_species_molal_idx", "entries_archived_idx"]);
    expect(plan.nodes).toContain("Index Only Scan");
  });

  it("keeps the same plan for a species as a generic plan (the finder prepares that statement)", async () => {
    // PostgreSQL may keep one generic plan for a prepared statement (db/prepared.ts); the
    // finder prepares only the one-species statement, whose plan must not depend on which
    // species it is given: the generic plan must read the species index as the plans above do.
    const statement = new PgDialect().sqlToQuery(
      solutionPageSql(filter("NaCl"), newest, firstPage, 1_000),
    );
    const client = new Client({ connectionString: process.env.DATABASE_URL });
    await client.connect();
    try {
      await client.query("set plan_cache_mode = force_generic_plan");
      await client.query(`prepare finder_page as ${statement.sql}`);
      // The values as literals (EXPLAIN EXECUTE takes expressions, not bound parameters).
      const literals = statement.params.map((p) =>
        typeof p === "number" ? String(p) : `'${String(p).replace(/'/g, "''")}'`,
      );
      const result = await client.query<{ "QUERY PLAN": [{ Plan: PlanNode }] }>(
        `explain (format json) execute finder_page(${literals.join(", ")})`,
      );
      const root = matchesOf(result.rows[0]["QUERY PLAN"][0].Plan);
      expect(root["Subplan Name"]).toBe("CTE m");
      expect([...indexesOf(root)].sort()).toEqual([
        "block_species_molal_idx",
        "entries_archived_idx",
      ]);
    } finally {
      await client.end();
    }
  });

  it("uses the molar species index on the molar scale", async () => {
    const plan = await planOf(solutionPageSql(filter("NaCl", "molar"), newest, firstPage, 1_000));
    expect(plan.indexes).toEqual(["block_species_molar_idx", "entries_archived_idx"]);
  });

  it("answers any of several species from the covering range index alone", async () => {
    const any: FinderFilter = { ...filter("NaCl"), species: ["NaCl", "RbCl"], speciesMatch: "any" };
    const plan = await planOf(solutionPageSql(any, newest, firstPage, 1_000));
    expect(plan.indexes).toEqual(["block_results_current_molal_idx", "entries_archived_idx"]);
    expect(plan.nodes).toContain("Index Only Scan");
  });

  it("finds exactly the rows a plain count finds", async () => {
    for (const species of ["NaCl", "RbCl"]) {
      const found = await getDb().execute<{ total: number }>(
        solutionPageSql(filter(species), newest, firstPage, 1_000),
      );
      const expected = await getDb().execute<{ n: number }>(sql`
        select count(*)::int as n from block_results
         where lab_id = ${labId} and to_revision is null and species @> ${sql.param([species])}::text[]
           and ionic_strength_molal between 0.09 and 0.11`);
      expect(found.rows[0].total).toBe(expected.rows[0].n);
    }
    // Both ions ("all of") through block_species, either of them through block_results.
    for (const speciesMatch of ["all", "any"] as const) {
      const ions: FinderFilter = { ...filter("NaCl"), species: ["Na+", "Cl-"], speciesMatch };
      const found = await getDb().execute<{ total: number }>(
        solutionPageSql(ions, newest, firstPage, 1_000),
      );
      const list = sql`${sql.param(["Na+", "Cl-"])}::text[]`;
      const expected = await getDb().execute<{ n: number }>(sql`
        select count(*)::int as n from block_results
         where lab_id = ${labId} and to_revision is null
           and ${speciesMatch === "all" ? sql`species @> ${list}` : sql`species && ${list}`}
           and ionic_strength_molal between 0.09 and 0.11`);
      expect(found.rows[0].total).toBe(expected.rows[0].n);
    }
  });
});
