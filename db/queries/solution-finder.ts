import { sql, type SQL } from "drizzle-orm";
import type { Executor } from "../client";
import { executePrepared } from "../prepared";
import { revisionMatches } from "./solution-finder-text";

/**
 * The solution finder's queries. Current solutions are the open block rows
 * (`to_revision IS NULL`); with `includeHistory` the closed rows of earlier revisions are
 * searched as well, through their own partial indexes, in a second branch of a UNION ALL so
 * that neither branch can wander into the other's rows. Every branch has the lab id in its
 * WHERE clause. Archived entries are left out by an anti-join over the small
 * `entries_archived_idx`; entry-level filters (author, project, status, text) are
 * semi-joins. The page's statement for a search that names species reads the current
 * solutions from block_species (one row per species of each open row) when it can
 * (speciesIndexServes, branches), so a range + species query reads the rows of that species
 * in the window from one covering index and nothing else (docs/architecture.md, "The
 * solution finder").
 */

export interface FinderFilter {
  labId: string;
  scale: "molal" | "molar";
  ionicStrengthMin?: number;
  ionicStrengthMax?: number;
  /** Canonical formulas; "all" must all be present, "any" at least one. */
  species: string[];
  speciesMatch: "all" | "any";
  temperatureMin?: number;
  temperatureMax?: number;
  solvent?: string;
  modelUsed?: string;
  authorId?: string;
  projectId?: string;
  status?: string;
  /** Block rows written at or after this instant … */
  savedFrom?: Date;
  /** … and strictly before this one. */
  savedBefore?: Date;
  /** A prefix tsquery (prefixTsquery) over the entry's title and text. */
  tsquery?: string;
  includeHistory: boolean;
}

type FinderSortColumn =
  "saved" | "name" | "ionicStrength" | "debye" | "temperature" | "entry" | "author" | "status";

export interface FinderSort {
  column: FinderSortColumn;
  direction: "asc" | "desc";
}

/** Sorts that need the entry (and its author) joined before ordering. */
const ENTRY_SORTS = new Set<FinderSortColumn>(["entry", "author", "status"]);

/**
 * The table a branch reads: `b` is block_results (open or closed rows); `s` is block_species,
 * the open rows' species index, read when a search names species (speciesIndexServes).
 */
type Rows = "b" | "s";

function ionicColumn(scale: FinderFilter["scale"], alias: string = "b"): SQL {
  return sql.raw(`${alias}.${scale === "molar" ? "ionic_strength_molar" : "ionic_strength_molal"}`);
}

function sortExpression(f: FinderFilter, column: FinderSortColumn, t: Rows = "b"): SQL {
  switch (column) {
    case "saved":
      return sql.raw(`${t}.created_at`);
    case "name":
      return sql.raw("lower(b.name)");
    case "ionicStrength":
      return ionicColumn(f.scale, t);
    case "debye":
      return sql.raw("b.debye_length_nm");
    case "temperature":
      return sql.raw("b.temperature_c");
    case "entry":
      return sql.raw("lower(e.title)");
    case "author":
      return sql.raw("lower(u.name)");
    case "status":
      return sql.raw("e.status");
  }
}

/** Sorts whose key block_species has, or reaches through the entry. */
const SPECIES_INDEX_SORTS = new Set<FinderSortColumn>([
  "saved",
  "ionicStrength",
  "entry",
  "author",
  "status",
]);

/**
 * Whether the current solutions of a search are read from block_species: the search names
 * species (all of them, or just one), filters on nothing but what block_species holds (lab,
 * I, date, and the entry's archiving, author, project, status and text) and sorts by a key it
 * has. It then reads the rows of the first species in the ionic-strength window from
 * block_species_molal_idx (or _molar_idx) alone, where block_results_current_molal_idx would
 * read every row of the window and test the species of each: eight times the rows for a
 * species in one solution in eight. Anything else reads block_results as before.
 */
function speciesIndexServes(f: FinderFilter, sort: FinderSort): boolean {
  return (
    f.species.length > 0 &&
    (f.speciesMatch === "all" || f.species.length === 1) &&
    SPECIES_INDEX_SORTS.has(sort.column) &&
    f.temperatureMin === undefined &&
    f.temperatureMax === undefined &&
    !f.solvent &&
    !f.modelUsed
  );
}

/**
 * The WHERE clause of one branch for the filter: the open or closed rows of block_results,
 * or (t = "s") the open rows' species in block_species, which speciesIndexServes allows only
 * for the conditions block_species can answer.
 */
function conditions(f: FinderFilter, open: boolean, t: Rows = "b"): SQL {
  const where: SQL[] = [
    t === "s" ? sql`s.lab_id = ${f.labId}` : sql`b.lab_id = ${f.labId}`,
    ...(t === "s" ? [] : [open ? sql`b.to_revision is null` : sql`b.to_revision is not null`]),
    sql`not exists (select 1 from entries xa where xa.id = ${sql.raw(t)}.entry_id and xa.archived_at is not null)`,
  ];
  const ionic = ionicColumn(f.scale, t);
  if (f.ionicStrengthMin !== undefined) where.push(sql`${ionic} >= ${f.ionicStrengthMin}`);
  if (f.ionicStrengthMax !== undefined) where.push(sql`${ionic} <= ${f.ionicStrengthMax}`);
  if (t === "s") {
    // The first species is read from the index; each other one ("all of") is the same
    // window of its own rows, which the planner hashes or probes row by row (rare species).
    const [first, ...others] = f.species;
    where.push(sql`s.species = ${first}`);
    const window = (column: SQL) => [
      ...(f.ionicStrengthMin !== undefined ? [sql` and ${column} >= ${f.ionicStrengthMin}`] : []),
      ...(f.ionicStrengthMax !== undefined ? [sql` and ${column} <= ${f.ionicStrengthMax}`] : []),
    ];
    for (const other of others)
      where.push(
        sql`s.block_result_id in (select s2.block_result_id from block_species s2 where s2.lab_id = ${f.labId} and s2.species = ${other}${sql.join(window(ionicColumn(f.scale, "s2")))})`,
      );
  } else if (f.species.length) {
    const list = sql`${sql.param(f.species)}::text[]`;
    where.push(f.speciesMatch === "all" ? sql`b.species @> ${list}` : sql`b.species && ${list}`);
  }
  if (f.temperatureMin !== undefined) where.push(sql`b.temperature_c >= ${f.temperatureMin}`);
  if (f.temperatureMax !== undefined) where.push(sql`b.temperature_c <= ${f.temperatureMax}`);
  if (f.solvent) where.push(sql`b.solvent = ${f.solvent}`);
  if (f.modelUsed) where.push(sql`b.model_used = ${f.modelUsed}`);
  const saved = sql.raw(`${t}.created_at`);
  if (f.savedFrom) where.push(sql`${saved} >= ${f.savedFrom.toISOString()}::timestamptz`);
  if (f.savedBefore) where.push(sql`${saved} < ${f.savedBefore.toISOString()}::timestamptz`);
  const entryId = sql.raw(`${t}.entry_id`);
  if (f.authorId || f.projectId || f.status) {
    const entry: SQL[] = [sql`xe.lab_id = ${f.labId}`];
    if (f.authorId) entry.push(sql`xe.author_id = ${f.authorId}`);
    if (f.projectId) entry.push(sql`xe.project_id = ${f.projectId}`);
    if (f.status) entry.push(sql`xe.status = ${f.status}`);
    where.push(
      sql`${entryId} in (select xe.id from entries xe where ${sql.join(entry, sql` and `)})`,
    );
  }
  if (f.tsquery) {
    // Current solutions: the entry's current revision must match. The matching entries are
    // collected first (an array, so the planner cannot turn it into a hash join over every
    // entry of the lab) and their open rows read through block_results_current_entry_idx.
    // History: a revision the row was shown in must match.
    where.push(
      open
        ? sql`${entryId} = any(array(select xr.entry_id from revisions xr join entries xc on xc.id = xr.entry_id and xc.current_revision_number = xr.number where xc.lab_id = ${f.labId} and ${revisionMatches("xr", f.tsquery)}))`
        : sql`exists (select 1 from revisions xr where xr.entry_id = b.entry_id and xr.number >= b.from_revision and xr.number < b.to_revision and ${revisionMatches("xr", f.tsquery)})`,
    );
  }
  return sql.join(where, sql` and `);
}

/** The rows a branch reads, with the entry and author joined only when the sort needs them. */
function branchFrom(sort: FinderSort, t: Rows = "b"): SQL {
  const rows = t === "s" ? sql`block_species s` : sql`block_results b`;
  return ENTRY_SORTS.has(sort.column)
    ? sql`${rows} join entries e on e.id = ${sql.raw(t)}.entry_id join users u on u.id = e.author_id`
    : rows;
}

/** One branch of the search: the rows it reads, their WHERE, and each match's id and key. */
interface Branch {
  from: SQL;
  where: SQL;
  id: SQL;
  key: SQL;
}

/**
 * The current solutions, and with `includeHistory` the closed rows, in a UNION ALL.
 * `speciesIndex`: whether the current solutions may be read from block_species. The page's
 * statement reads at most 1 001 matches in no order, so the species' own rows are the
 * fewest it can read. A statement that reads matches in order (past 1 001 matches, and the
 * export) reads block_results, whose date and I indexes let it stop after the rows it needs,
 * where block_species would read every row of the species in the window to sort them (for a
 * species in half the solutions, a hundred thousand rows).
 */
function branches(f: FinderFilter, sort: FinderSort, speciesIndex: boolean): Branch[] {
  return (f.includeHistory ? [true, false] : [true]).map((open) => {
    const t: Rows = speciesIndex && open && speciesIndexServes(f, sort) ? "s" : "b";
    return {
      from: branchFrom(sort, t),
      where: conditions(f, open, t),
      id: sql.raw(t === "s" ? "s.block_result_id" : "b.id"),
      key: sortExpression(f, sort.column, t),
    };
  });
}

/** Sort columns that may be null (a block whose inputs the engine refused has no I). */
const NULLABLE_SORTS = new Set<FinderSortColumn>(["ionicStrength", "debye"]);

/**
 * ORDER BY for a sort on a key and an id, ties broken by id. Nulls go last; "nulls last" is
 * written only for columns that can be null, because on a NOT NULL column it would still
 * stop PostgreSQL from reading an index backwards (newest first) in index order.
 */
function orderBy(sort: FinderSort, key: SQL, id: SQL): SQL {
  const dir = sql.raw(sort.direction === "asc" ? "asc" : "desc");
  const nulls = sql.raw(NULLABLE_SORTS.has(sort.column) ? " nulls last" : "");
  return sql`${key} ${dir}${nulls}, ${id} ${dir}`;
}

/** The order of merged branches' (or collected) matches, by their columns k and id. */
function orderByColumns(sort: FinderSort, prefix: string): SQL {
  return orderBy(sort, sql.raw(`${prefix}k`), sql.raw(`${prefix}id`));
}

export interface FinderRow {
  id: string;
  entryId: string;
  blockId: string;
  fromRevision: number;
  toRevision: number | null;
  name: string;
  ionicStrengthMolal: number | null;
  ionicStrengthMolar: number | null;
  debyeLengthNm: number | null;
  temperatureC: number;
  solvent: string;
  modelUsed: string | null;
  species: string[];
  /** The recipe in one line, formulas typeset (solution_results.composition_summary). */
  composition: string;
  createdAt: Date;
  entryTitle: string;
  entryStatus: string;
  authorName: string;
  projectName: string;
}

/**
 * What the table shows of a block row. The recipe, author and project are scalar subqueries
 * on their primary keys (every block row has exactly one of each), so the planner orders two
 * joins instead of five: planning the five-way join took longer than running it for a page
 * of 50 rows (about 0.9 against 0.5 ms for the page statement at a million rows).
 */
const DETAIL_COLUMNS = sql`
  b.id, b.entry_id as "entryId", b.block_id as "blockId", b.from_revision as "fromRevision",
  b.to_revision as "toRevision", b.name, b.ionic_strength_molal as "ionicStrengthMolal",
  b.ionic_strength_molar as "ionicStrengthMolar", b.debye_length_nm as "debyeLengthNm",
  b.temperature_c as "temperatureC", b.solvent, b.model_used as "modelUsed", b.species,
  (select coalesce(r.composition_summary, '') from solution_results r where r.id = b.result_id) as composition,
  b.created_at as "createdAt", e.title as "entryTitle", e.status as "entryStatus",
  (select u.name from users u where u.id = e.author_id) as "authorName",
  (select p.name from projects p where p.id = e.project_id) as "projectName"`;

const DETAIL_FROM = sql`block_results b join entries e on e.id = b.entry_id`;

/** A row as db.execute or the page's json_agg returns it (created_at as text either way). */
function rowOf(r: Record<string, unknown>): FinderRow {
  return { ...(r as unknown as FinderRow), createdAt: new Date(r.createdAt as string) };
}

export interface FinderPage {
  /** Matches counted, up to the cap (more than the cap is reported as capped). */
  total: number;
  capped: boolean;
  rows: FinderRow[];
}

/**
 * The finder's main statement: every match up to cap + 1 with its sort key, counted, and one
 * page of them in order with what the table shows, in one round trip. The page comes as one
 * JSON array (json_agg), which the server reads with one JSON.parse: node-postgres reading
 * 50 rows of 20 columns field by field was most of the finder's own CPU time in Node.js.
 * Exported so that the plan tests EXPLAIN exactly what runs.
 */
export function solutionPageSql(
  f: FinderFilter,
  sort: FinderSort,
  page: { limit: number; offset: number },
  cap: number,
): SQL {
  const union = sql.join(
    branches(f, sort, true).map(
      (b) =>
        sql`(select ${b.id} as id, ${b.key} as k from ${b.from} where ${b.where} limit ${cap + 1})`,
    ),
    sql` union all `,
  );
  return sql`
    with m as materialized (select * from (${union}) u limit ${cap + 1}),
         pg as materialized (select m.id, row_number() over (order by ${orderByColumns(sort, "m.")}) as n
                               from m order by ${orderByColumns(sort, "m.")}
                              limit ${page.limit} offset ${page.offset})
    select (select count(*) from m)::int as total,
           (select coalesce(json_agg(d order by d.n), '[]')
              from (select ${DETAIL_COLUMNS}, pg.n from pg join ${DETAIL_FROM} on b.id = pg.id
                     where b.lab_id = ${f.labId}) d) as rows`;
}

/**
 * Whether the page's statement may keep a generic plan (executePrepared): one species read
 * from block_species, in an I window and dates, sorted by a key block_species has, without
 * entry-level filters. Its plan is the same for every species and window (a scan of the
 * species' rows in the window; tests/integration/solution-finder-plans.test.ts checks the
 * generic plan too), and planning it cost a third of its time: at a million solution rows
 * 2.5 → 1.7 ms for a species in one solution in eight, 1.1 → 0.3 ms for one in a thousand.
 * Every other shape is planned for its values: for two species the best join order depends
 * on which one is rare, and a generic plan that guessed wrong ran 50 ms instead of 1.5 ms.
 */
function planCacheServes(f: FinderFilter, sort: FinderSort): boolean {
  return (
    speciesIndexServes(f, sort) &&
    f.species.length === 1 &&
    !f.includeHistory &&
    !f.tsquery &&
    !f.authorId &&
    !f.projectId &&
    !f.status &&
    !ENTRY_SORTS.has(sort.column)
  );
}

/**
 * One page of matches in the requested order, and how many match (counted up to `cap`):
 * one statement (solutionPageSql) when there are at most `cap`; past that the page is read
 * again in index order, the cheaper way for a broad search, and its rows fetched by id.
 */
export async function findSolutionPage(
  db: Executor,
  f: FinderFilter,
  sort: FinderSort,
  page: { limit: number; offset: number },
  cap: number,
): Promise<FinderPage> {
  const statement = solutionPageSql(f, sort, page, cap);
  type First = { total: number; rows: Record<string, unknown>[] };
  const [first] = planCacheServes(f, sort)
    ? await executePrepared<First>(db, statement)
    : (await db.execute<First>(statement)).rows;
  if (first.total <= cap) {
    return { total: first.total, capped: false, rows: first.rows.map(rowOf) };
  }
  const second = await db.execute<{ id: string }>(orderedIdsSql(f, sort, page));
  const rows = await findSolutionRows(
    db,
    f.labId,
    second.rows.map((r) => r.id),
  );
  return { total: cap, capped: true, rows };
}

/** What the table shows for the given block rows of the lab, in the order of `ids`. */
export async function findSolutionRows(
  db: Executor,
  labId: string,
  ids: string[],
): Promise<FinderRow[]> {
  if (!ids.length) return [];
  const result = await db.execute<Record<string, unknown>>(sql`
    select ${DETAIL_COLUMNS} from ${DETAIL_FROM}
     where b.lab_id = ${labId} and b.id = any(${sql.param(ids)}::uuid[])`);
  const byId = new Map(result.rows.map((r) => [r.id as string, rowOf(r)]));
  return ids.flatMap((id) => byId.get(id) ?? []);
}

/**
 * Where the CSV export goes on: the last row it listed, by its sort key (as text, which
 * round-trips a float8 and a timestamptz exactly; null when the row has no value in the sort
 * column) and its id.
 */
export interface FinderKeyset {
  key: string | null;
  id: string;
}

/** The type a sort key is compared as when it comes back as text. */
const SORT_KEY_TYPES: Record<FinderSortColumn, string> = {
  saved: "timestamptz",
  name: "text",
  ionicStrength: "float8",
  debye: "float8",
  temperature: "float8",
  entry: "text",
  author: "text",
  status: "text",
};

/**
 * The rows that come after `keyset` in the order of orderBy: (key, id) beyond the keyset's as
 * a row comparison, in the sort's direction (ties are broken by id in the same direction). On
 * a nullable column nulls come last either way, so every null row is beyond a non-null key;
 * among the nulls (a null keyset key) the id alone goes on.
 */
function beyond(sort: FinderSort, branch: Branch, keyset: FinderKeyset): SQL {
  const { key, id } = branch;
  const op = sql.raw(sort.direction === "asc" ? ">" : "<");
  const lastId = sql`${keyset.id}::uuid`;
  if (keyset.key === null) return sql`${key} is null and ${id} ${op} ${lastId}`;
  const typed = sql`${keyset.key}::${sql.raw(SORT_KEY_TYPES[sort.column])}`;
  const after = sql`(${key}, ${id}) ${op} (${typed}, ${lastId})`;
  return NULLABLE_SORTS.has(sort.column) ? sql`(${after} or ${key} is null)` : after;
}

/**
 * The ids of one stretch of the matches in the table's order (orderBy), with each row's sort
 * key as text: `limit` rows from `offset`, counted from the first match or from the first row
 * beyond `after`. Each branch reads its own first offset + limit in order (an index in that
 * order walks no further), then the branches are merged. Rows are read by id afterwards
 * (findSolutionRows), so the sort works on narrow rows.
 */
function orderedIdsSql(
  f: FinderFilter,
  sort: FinderSort,
  page: { limit: number; offset: number },
  after: FinderKeyset | null = null,
): SQL {
  const reach = page.limit + page.offset;
  const ordered = sql.join(
    branches(f, sort, false).map((b) => {
      const resume = after ? sql` and ${beyond(sort, b, after)}` : sql``;
      return sql`(select ${b.id} as id, ${b.key} as k from ${b.from} where ${b.where}${resume} order by ${orderBy(sort, b.key, b.id)} limit ${reach})`;
    }),
    sql` union all `,
  );
  return sql`
    select u.id, u.k::text as key from (${ordered}) u order by ${orderByColumns(sort, "u.")}
     limit ${page.limit} offset ${page.offset}`;
}

/**
 * The next `limit` matches of the whole result set for the CSV export, as keysets (id and
 * sort key), in the table's order (the query's sort column and direction, ties broken by id,
 * nulls last) after the keyset of the previous call; the rows are read by id
 * (findSolutionRows).
 *
 * Why a keyset on (sort key, id) and not a cursor: each call is a statement of its own, so a
 * slow download holds neither one of the pool's 10 connections nor a snapshot between calls.
 * It is exact under concurrent saves because block rows are never deleted and their own
 * columns (name, I, λD, T, date) never change: every row that matches from the first call to
 * the last is listed once, in order; a row saved meanwhile is listed if it sorts after the
 * rows already listed. Sorted by an entry's title, status or author's name, which can change
 * during a long export, a row whose entry changed under it can cross the keyset (listed twice,
 * or not at all); a REPEATABLE READ cursor would avoid that but would hold a connection and
 * its snapshot for as long as the client takes to read. The cost: a sort that no index serves
 * reads every match beyond the keyset for each call (a top-N sort of narrow rows), which is
 * why the export asks for thousands of keys at a time and reads their rows in smaller batches.
 */
export async function findSolutionKeys(
  db: Executor,
  f: FinderFilter,
  sort: FinderSort,
  after: FinderKeyset | null,
  limit: number,
): Promise<FinderKeyset[]> {
  const result = await db.execute<{ id: string; key: string | null }>(
    orderedIdsSql(f, sort, { limit, offset: 0 }, after),
  );
  return result.rows.map((r) => ({ id: r.id, key: r.key }));
}
