// @vitest-environment node
/**
 * The lint configuration enforces what docs/architecture.md promises: a component that
 * imports db/, lib/chem importing anything of ours, a floating promise, or a Drizzle delete
 * without where() each fail `npm test`. Each probe is a real file in the layer it pretends
 * to be (the import rules depend on where a file lives), removed afterwards.
 */
import { rmSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { ESLint } from "eslint";
import { afterAll, beforeAll, describe, expect, it } from "vitest";

const ROOT = join(__dirname, "../../..");
const PROBES = {
  componentImportsDb: {
    path: "components/zz-lint-probe-db.ts",
    code: 'import { users } from "@/db/schema";\nexport const probe = users;\n',
  },
  chemImportsOurs: {
    path: "lib/chem/zz-lint-probe.ts",
    code: 'import { AppError } from "@/lib/errors";\nexport const probe = AppError;\n',
  },
  floatingPromise: {
    path: "lib/notebook/zz-lint-probe-promise.ts",
    code: "async function later(): Promise<number> {\n  return 1;\n}\nexport function probe(): void {\n  later();\n}\n",
  },
  deleteWithoutWhere: {
    path: "db/queries/zz-lint-probe-delete.ts",
    code:
      'import type { NodePgDatabase } from "drizzle-orm/node-postgres";\n' +
      'import { projects } from "../schema";\n' +
      "export async function probe(db: NodePgDatabase) {\n  await db.delete(projects);\n}\n",
  },
  clean: {
    path: "lib/notebook/zz-lint-probe-clean.ts",
    code: "export async function probe(): Promise<number> {\n  return Promise.resolve(1);\n}\n",
  },
} as const;

type ProbeName = keyof typeof PROBES;
const results = new Map<ProbeName, ESLint.LintResult>();

beforeAll(async () => {
  for (const probe of Object.values(PROBES)) writeFileSync(join(ROOT, probe.path), probe.code);
  try {
    const eslint = new ESLint({ cwd: ROOT });
    const names = Object.keys(PROBES) as ProbeName[];
    const linted = await eslint.lintFiles(names.map((name) => PROBES[name].path));
    for (const result of linted) {
      const name = names.find((n) => result.filePath.endsWith(PROBES[n].path));
      if (name) results.set(name, result);
    }
  } finally {
    for (const probe of Object.values(PROBES)) rmSync(join(ROOT, probe.path), { force: true });
  }
}, 120_000);

afterAll(() => {
  for (const probe of Object.values(PROBES)) rmSync(join(ROOT, probe.path), { force: true });
});

const rulesOf = (name: ProbeName) => results.get(name)?.messages.map((m) => m.ruleId) ?? [];

describe("lint configuration", () => {
  it("linted every probe", () => {
    expect([...results.keys()].sort()).toEqual(Object.keys(PROBES).sort());
  });

  it("refuses a component that imports db/", () => {
    expect(rulesOf("componentImportsDb")).toContain("boundaries/dependencies");
  });

  it("refuses lib/chem importing anything of ours", () => {
    expect(rulesOf("chemImportsOurs")).toContain("boundaries/dependencies");
  });

  it("refuses a floating promise", () => {
    expect(rulesOf("floatingPromise")).toContain("@typescript-eslint/no-floating-promises");
  });

  it("refuses a Drizzle delete without where()", () => {
    expect(rulesOf("deleteWithoutWhere")).toContain("drizzle/enforce-delete-with-where");
  });

  it("passes a file that follows the rules", () => {
    expect(results.get("clean")?.messages).toEqual([]);
  });
});
