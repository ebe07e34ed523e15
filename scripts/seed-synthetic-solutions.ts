/**
 * Seeds 1 000 000 synthetic solution rows into the scratch benchmark database (never the demo,
 * never `npm start`'s or `npm test`'s data): a lab named "Synthetic bench lab" with 40 000
 * entries of 5 solution blocks, each entry with 5 revisions in which every block changed, so
 * `block_results` holds 1 000 000 rows of which 200 000 are open (each entry's current
 * solutions); 200 000 distinct stored results behind them; a second synthetic lab with 1 000
 * entries so that the lab filter has something to exclude.
 *
 *   npx tsx --tsconfig tsconfig.scripts.json scripts/seed-synthetic-solutions.ts
 *
 * starts the scratch cluster (scripts/support/scratch-database.ts), migrates and seeds once;
 * `npm run bench` does the same when the database is missing. Everything is clearly synthetic:
 * titles begin with "[synthetic]", e-mails end in ".invalid". Deterministic (seeded PRNG and
 * PostgreSQL's hashint4), about a minute and a half on two cores.
 */
import { createHash } from "node:crypto";
import argon2 from "argon2";
import { Client } from "pg";
import { resolveSpecies } from "@/lib/chem";
import { compositionSummary } from "@/lib/document/composition-summary";
import { runMigrations } from "./migrate";
import { ensureScratchDatabase, type ScratchDatabase } from "./support/scratch-database";

export const SYNTHETIC_LAB_SLUG = "synthetic-bench";
export const SYNTHETIC_PASSWORD = "synthetic-bench-password";
/** The member the bench signs in as. */
export const SYNTHETIC_MEMBER_EMAIL = "researcher1@synthetic-bench.invalid";
/** In one current solution in eight (the "very common" species). */
export const COMMON_SPECIES = "NaCl";
/** In about one current solution in a thousand. */
export const RARE_SPECIES = "RbCl";

const ENTRIES = 40_000;
const NEIGHBOUR_ENTRIES = 1_000;
const BLOCKS = 5;
const REVISIONS = 5;
const RECIPES = 200_000;
const NEIGHBOUR_RECIPES = 5_000;

/** Supporting electrolytes with their share of solutions. */
const SUPPORTING: [string, number][] = [
  [COMMON_SPECIES, 0.125],
  [RARE_SPECIES, 0.001],
  ["KCl", 0.16],
  ["KNO3", 0.08],
  ["NaClO4", 0.07],
  ["LiClO4", 0.06],
  ["Na2SO4", 0.07],
  ["K2SO4", 0.05],
  ["MgSO4", 0.04],
  ["CaCl2", 0.03],
  ["LiCl", 0.04],
  ["NaNO3", 0.04],
  ["KH2PO4", 0.05],
  ["K2HPO4", 0.05],
  ["NaOH", 0.02],
  ["KOH", 0.03],
  ["HCl", 0.02],
  ["H2SO4", 0.02],
  ["CsCl", 0.005],
  ["NaBr", 0.01],
  ["KI", 0.009],
  ["NH4Cl", 0.01],
];
const PROBES = ["K3Fe(CN)6", "K4Fe(CN)6", "CuSO4", "ZnSO4"];

/** mulberry32: a small seeded PRNG, so every run seeds the same rows. */
function prng(seed: number) {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

interface Recipe {
  inputsHash: string;
  name: string;
  temperatureC: number;
  modelUsed: string;
  molal: number;
  molar: number;
  debyeNm: number;
  species: string[];
  composition: Record<string, number>;
  summary: string;
  inputs: Record<string, unknown>;
}

/**
 * A synthetic solution: a supporting electrolyte (log-uniform 1 mmol/kg–2 mol/kg) and, in
 * 45 % of them, a redox probe (0.1–10 mmol/kg). Ionic strength is exact for full
 * dissociation, I = ½ Σ m z²; the Debye length is the 25 °C water value 0.304 nm / √I. The
 * numbers are plausible, not the engine's: this data only has to be searched.
 */
function makeRecipe(i: number, random: () => number): Recipe {
  let pick = random() * SUPPORTING.reduce((s, [, w]) => s + w, 0);
  let salt = SUPPORTING[0][0];
  for (const [formula, weight] of SUPPORTING) {
    pick -= weight;
    if (pick <= 0) {
      salt = formula;
      break;
    }
  }
  const components = [{ formula: salt, amount: 10 ** (-3 + random() * 3.301), unit: "mol/kg" }];
  if (random() < 0.45) {
    const probe = PROBES[Math.floor(random() * PROBES.length)];
    components.push({ formula: probe, amount: 10 ** (-4 + random() * 2), unit: "mol/kg" });
  }
  const composition: Record<string, number> = {};
  let ionic = 0;
  for (const c of components) {
    for (const ion of resolveSpecies(c.formula).ions) {
      const m = c.amount * ion.count;
      composition[ion.formula] = (composition[ion.formula] ?? 0) + m;
      ionic += 0.5 * m * ion.charge ** 2;
    }
  }
  const temperatureC = random() < 0.6 ? 25 : Math.round((5 + random() * 55) * 2) / 2;
  const inputs = {
    name: `${salt} ${components[0].amount.toPrecision(3)} mol/kg`,
    solvent: "water",
    temperatureC,
    densityGPerMl: null,
    model: "auto",
    components,
    synthetic: i,
  };
  return {
    inputsHash: createHash("sha256").update(JSON.stringify(inputs)).digest("hex"),
    name: inputs.name,
    temperatureC,
    modelUsed: ionic < 0.1 ? "dh-extended" : ionic < 0.5 ? "davies" : "pitzer",
    molal: ionic,
    molar: ionic * 0.997,
    debyeNm: 0.304 / Math.sqrt(ionic),
    species: [...new Set([...components.map((c) => c.formula), ...Object.keys(composition)])],
    composition,
    summary: compositionSummary(components),
    inputs,
  };
}

/** The load is one transaction: when the lab is there, all of it is (the save bench adds more). */
async function alreadySeeded(client: Client): Promise<boolean> {
  const { rows } = await client.query(`select 1 from labs where slug = $1`, [SYNTHETIC_LAB_SLUG]);
  return rows.length === 1;
}

/** Drops the secondary indexes of the tables we fill (loading is faster without them). */
async function dropIndexes(client: Client, tables: string[]): Promise<string[]> {
  const { rows } = await client.query<{ name: string; def: string }>(
    `select i.indexname as name, i.indexdef as def from pg_indexes i
      where i.schemaname = 'public' and i.tablename = any($1)
        and not exists (select 1 from pg_constraint c where c.conname = i.indexname)`,
    [tables],
  );
  for (const r of rows) await client.query(`drop index "${r.name}"`);
  return rows.map((r) => r.def);
}

async function insertLabWithPeople(client: Client, slug: string, name: string, hash: string) {
  const lab = await client.query<{ id: string }>(
    `insert into labs (name, slug) values ($1, $2) returning id`,
    [name, slug],
  );
  const labId = lab.rows[0].id;
  await client.query(
    `insert into users (lab_id, email, name, role, password_hash)
     select $1, r.role || g || '@' || $2 || '.invalid', 'Synthetic ' || r.role || ' ' || g, r.role, $3
       from generate_series(1, 12) g
       cross join lateral (select case when g = 1 then 'researcher' when g <= 2 then 'admin'
                                       when g <= 4 then 'supervisor' else 'researcher' end as role) r`,
    [labId, slug, hash],
  );
  await client.query(
    `insert into projects (lab_id, name, created_by_id)
     select $1, '[synthetic] Project ' || g, (select id from users where lab_id = $1 limit 1)
       from generate_series(1, 24) g`,
    [labId],
  );
  return labId;
}

async function insertRecipes(client: Client, labId: string, count: number, random: () => number) {
  await client.query(`drop table if exists seed_recipes`);
  await client.query(`create temp table seed_recipes (n int primary key, id uuid not null)`);
  const batch = Math.min(5_000, count);
  for (let start = 0; start < count; start += batch) {
    const recipes = Array.from({ length: batch }, (_, k) => makeRecipe(start + k, random));
    await client.query(
      `with ins as (
         insert into solution_results (lab_id, inputs_hash, engine_version, name, temperature_c,
           solvent, model_requested, model_used, ionic_strength_molal, ionic_strength_molar,
           debye_length_nm, species, composition, results, inputs, composition_summary)
         select $1, h, 'synthetic', nm, t, 'water', 'auto', mu, im, ic, dl,
                array(select jsonb_array_elements_text(sp)), co,
                jsonb_build_object('status', 'ok', 'synthetic', true, 'ionicStrength',
                  jsonb_build_object('molal', im, 'molar', ic), 'debyeLengthNm', dl), inp, cs
           from unnest($2::text[], $3::text[], $4::float8[], $5::text[], $6::float8[],
                       $7::float8[], $8::float8[], $9::jsonb[], $10::jsonb[], $11::jsonb[], $12::int[],
                       $13::text[])
             as u(h, nm, t, mu, im, ic, dl, sp, co, inp, n, cs)
         returning id, inputs_hash)
       insert into seed_recipes (n, id)
       select u.n, ins.id from ins join unnest($2::text[], $12::int[]) as u(h, n) on u.h = ins.inputs_hash`,
      [
        labId,
        recipes.map((r) => r.inputsHash),
        recipes.map((r) => r.name),
        recipes.map((r) => r.temperatureC),
        recipes.map((r) => r.modelUsed),
        recipes.map((r) => r.molal),
        recipes.map((r) => r.molar),
        recipes.map((r) => r.debyeNm),
        recipes.map((r) => JSON.stringify(r.species)),
        recipes.map((r) => JSON.stringify(r.composition)),
        recipes.map((r) => JSON.stringify(r.inputs)),
        recipes.map((_, k) => start + k + 1),
        recipes.map((r) => r.summary),
      ],
    );
  }
}

/** Entries, their five revisions and their block rows, all in SQL. */
async function insertEntries(
  client: Client,
  labId: string,
  count: number,
  recipeCount: number,
  revisions: number,
) {
  await client.query(`drop table if exists seed_entries`);
  await client.query(
    `create temp table seed_entries as
     select g as n, gen_random_uuid() as id,
            (array['cyclic voltammetry','chronoamperometry','impedance spectroscopy',
                   'linear sweep voltammetry','square wave voltammetry','chronopotentiometry',
                   'rotating disk voltammetry','bulk electrolysis'])[1 + abs(hashint4(g * 7)) % 8] as technique,
            (array['ferricyanide','ferrocyanide','dopamine','ascorbic acid','copper deposition',
                   'zinc plating','hydrogen evolution','oxygen reduction','benzoquinone',
                   'hexaammineruthenium'])[1 + abs(hashint4(g * 11)) % 10]
              || case when g % 500 = 0 then ' and ferrocenemethanol' else '' end as analyte,
            (array['glassy carbon','platinum disk','gold disk','boron-doped diamond',
                   'carbon fibre','screen-printed carbon'])[1 + abs(hashint4(g * 13)) % 6] as electrode,
            (select id from users where lab_id = $1 order by email offset abs(hashint4(g * 17)) % 12 limit 1) as author_id,
            (select id from projects where lab_id = $1 order by name offset abs(hashint4(g * 19)) % 24 limit 1) as project_id,
            case when g % 20 < 14 then 'draft' when g % 20 < 16 then 'submitted'
                 when g % 20 < 19 then 'countersigned' else 'returned' end as status,
            timestamptz '2025-01-01 08:00+00' + (g::float8 / $2) * interval '690 days' as created_at
       from generate_series(1, $2::int) g`,
    [labId, count],
  );
  await client.query(
    `insert into entries (id, lab_id, project_id, title, status, author_id, current_revision_number,
                          signed_revision_number, created_at, updated_at)
     select id, $1, project_id, '[synthetic] ' || initcap(technique) || ' of ' || analyte || ' #' || n,
            status, author_id, ${revisions}, case when status = 'countersigned' then ${revisions} end,
            created_at, created_at + interval '${revisions - 1} days'
       from seed_entries`,
    [labId],
  );
  await client.query(
    `insert into revisions (entry_id, number, title, content, content_text, content_hash, author_id, created_at)
     select e.id, v, t.title, jsonb_build_object('type', 'doc', 'content', jsonb_build_array(
              jsonb_build_object('type', 'paragraph', 'content', jsonb_build_array(
                jsonb_build_object('type', 'text', 'text', t.body))))),
            t.body, encode(sha256(convert_to(t.title || t.body, 'UTF8')), 'hex'), e.author_id,
            e.created_at + (v - 1) * interval '1 day'
       from seed_entries e cross join generate_series(1, ${revisions}) v
       cross join lateral (select '[synthetic] ' || initcap(e.technique) || ' of ' || e.analyte || ' #' || e.n as title,
            'Synthetic benchmark entry. ' || initcap(e.technique) || ' of ' || e.analyte || ' on a ' || e.electrode
            || ' electrode, revision ' || v || '. '
            || (array['Polished with alumina slurry and rinsed.','Degassed with nitrogen for ten minutes.',
                      'Uncompensated resistance corrected by positive feedback.','Scan rates from 10 to 500 mV/s.',
                      'Reference electrode checked against a second one.','Temperature held by a water jacket.'])
               [1 + abs(hashint4(e.n * 23 + v)) % 6] as body) t`,
  );
  await client.query(
    `insert into block_results (lab_id, entry_id, block_id, result_id, from_revision, to_revision, position,
                                name, temperature_c, solvent, model_used, ionic_strength_molal,
                                ionic_strength_molar, debye_length_nm, species, created_at)
     select $1, e.id, 'synthetic-' || e.n || '-' || b, r.id, v, case when v < ${revisions} then v + 1 end, b - 1,
            r.name, r.temperature_c, r.solvent, r.model_used, r.ionic_strength_molal,
            r.ionic_strength_molar, r.debye_length_nm, r.species,
            e.created_at + (v - 1) * interval '1 day' + b * interval '1 second'
       from seed_entries e
       cross join generate_series(1, ${BLOCKS}) b
       cross join generate_series(1, ${revisions}) v
       join seed_recipes k on k.n = 1 + abs(hashint4(e.n * 31 + b * 7 + v * 1000003)) % $2
       join solution_results r on r.id = k.id`,
    [labId, recipeCount],
  );
  // The finder's species index, which triggers keep when they are not switched off.
  await client.query(
    `insert into block_species (block_result_id, lab_id, species, ionic_strength_molal,
                                ionic_strength_molar, entry_id, created_at)
     select distinct b.id, b.lab_id, s.species, b.ionic_strength_molal, b.ionic_strength_molar,
            b.entry_id, b.created_at
       from block_results b cross join lateral unnest(b.species) as s(species)
      where b.lab_id = $1 and b.to_revision is null`,
    [labId],
  );
}

export interface SyntheticLabOptions {
  slug: string;
  name: string;
  /** Entries, each with BLOCKS solution blocks … */
  entries: number;
  /** … and this many revisions, every block changed in each. */
  revisions: number;
  /** Distinct stored results the blocks are drawn from. */
  recipes: number;
  /** Seed of the recipe generator. */
  seed: number;
}

/**
 * One synthetic lab: 12 members (password SYNTHETIC_PASSWORD), 24 projects, entries with
 * their revisions and block rows (and the open rows' species in block_species, which the
 * triggers switched off here would write). Run by a superuser session with
 * `session_replication_role = replica` inside a transaction (the caller's), so that
 * foreign keys and the record guards are not checked row by row. The tests' plan checks
 * use it on a small scale. Returns the lab id.
 */
export async function seedSyntheticLab(client: Client, o: SyntheticLabOptions): Promise<string> {
  const hash = await argon2.hash(SYNTHETIC_PASSWORD, { type: argon2.argon2id });
  const labId = await insertLabWithPeople(client, o.slug, o.name, hash);
  await insertRecipes(client, labId, o.recipes, prng(o.seed));
  await insertEntries(client, labId, o.entries, o.recipes, o.revisions);
  return labId;
}

/** Seeds the synthetic labs into a migrated scratch database unless they are there already. */
export async function seedSyntheticSolutions(db: ScratchDatabase): Promise<"seeded" | "present"> {
  const client = new Client({ connectionString: db.superuserUrl });
  await client.connect();
  try {
    if (await alreadySeeded(client)) return "present";
    const started = performance.now();
    console.log("[ionleaf] seeding 1 000 000 synthetic solution rows (once; about 2 minutes)");
    await client.query(`set synchronous_commit = off`);
    await client.query(`set maintenance_work_mem = '512MB'`);
    // Bulk load as the superuser: foreign keys and the record guards are checked by
    // construction here, not row by row.
    await client.query(`set session_replication_role = replica`);
    await client.query("begin");
    const tables = ["block_results", "block_species", "solution_results", "revisions", "entries"];
    const indexes = await dropIndexes(client, tables);
    await seedSyntheticLab(client, {
      slug: SYNTHETIC_LAB_SLUG,
      name: "Synthetic bench lab",
      entries: ENTRIES,
      revisions: REVISIONS,
      recipes: RECIPES,
      seed: 20261202,
    });
    await seedSyntheticLab(client, {
      slug: "synthetic-neighbour",
      name: "Synthetic neighbour lab",
      entries: NEIGHBOUR_ENTRIES,
      revisions: REVISIONS,
      recipes: NEIGHBOUR_RECIPES,
      seed: 7,
    });
    for (const def of indexes) await client.query(def);
    await client.query("commit");
    await client.query(`set session_replication_role = origin`);
    for (const t of tables) await client.query(`vacuum analyze ${t}`);
    console.log(
      `[ionleaf] synthetic data seeded in ${((performance.now() - started) / 1000).toFixed(0)} s`,
    );
    return "seeded";
  } finally {
    await client.end();
  }
}

/** Starts the scratch cluster, migrates it and seeds it once. */
export async function ensureSyntheticDatabase(): Promise<ScratchDatabase> {
  const db = ensureScratchDatabase();
  await runMigrations(db.url);
  await seedSyntheticSolutions(db);
  return db;
}

const isMain = process.argv[1] && new URL(import.meta.url).pathname === process.argv[1];
if (isMain) {
  ensureSyntheticDatabase()
    .then((db) => console.log(`[ionleaf] synthetic database ready: ${db.url}`))
    .catch((error: unknown) => {
      console.error("[ionleaf] synthetic seeding failed:", error);
      process.exit(1);
    });
}
