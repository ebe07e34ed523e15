import { Client } from "pg";
import { runMigrations } from "./scripts/migrate";
import { ensureScratchDatabase } from "./scripts/support/scratch-database";
import { seedSyntheticLab } from "./scripts/seed-synthetic-solutions";
import { solutionPageSql } from "./db/queries/solution-finder";
import { PgDialect } from "drizzle-orm/pg-core";
async function main() {
  const db = ensureScratchDatabase("ionleaf_plans");
  await runMigrations(db.url);
  const c = new Client({ connectionString: db.superuserUrl }); await c.connect();
  const { rows } = await c.query("select id from labs where slug = 'plans'");
  let labId = rows[0]?.id;
  if (!labId) {
    await c.query("set session_replication_role = replica"); await c.query("begin");
    labId = await seedSyntheticLab(c, { slug: "plans", name: "Plans", entries: Number(process.env.N ?? 4800), revisions: 1, recipes: 6000, seed: 3 });
    await c.query("commit"); await c.query("set session_replication_role = origin");
  }
  const o = new Client({ connectionString: db.url }); await o.connect();
  await o.query("vacuum analyze block_results"); await o.query("vacuum analyze entries");
  const dialect = new PgDialect();
  for (const sp of ["NaCl", "RbCl"]) {
    const q = dialect.sqlToQuery(solutionPageSql({ labId, scale: "molal", ionicStrengthMin: 0.09, ionicStrengthMax: 0.11, species: [sp], speciesMatch: "all", includeHistory: false }, { column: "saved", direction: "desc" }, { limit: 50, offset: 0 }, 10000));
    const r = await o.query("explain " + q.sql, q.params);
    console.log(sp, r.rows.map((x: any) => x["QUERY PLAN"]).join("\n"));
    await o.query("begin"); await o.query(process.env.DROP === "gin" ? "drop index block_results_current_species_idx" : "drop index block_results_current_molal_idx");
    const r2 = await o.query("explain " + q.sql, q.params);
    console.log("ALT", sp, r2.rows.map((x: any) => x["QUERY PLAN"]).join("\n"));
    await o.query("rollback");
  }
  await c.end(); await o.end();
}
main();
