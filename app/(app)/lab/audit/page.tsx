import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { requireActor } from "@/lib/access/actor";
import { isAppError } from "@/lib/errors";
import { searchAudit } from "@/lib/labs/audit";
import { listMembers } from "@/lib/labs/members";
import { roleCan } from "@/lib/rules/role-permissions";

export const metadata: Metadata = { title: "Audit trail" };

type Search = Record<string, string | undefined>;

function withPage(query: Search, page: number): string {
  const params = new URLSearchParams();
  for (const [k, v] of Object.entries(query)) if (v && k !== "page") params.set(k, v);
  params.set("page", String(page));
  return `?${params.toString()}`;
}

export default async function AuditPage({ searchParams }: { searchParams: Promise<Search> }) {
  const actor = await requireActor();
  if (!roleCan(actor.role, "audit.read")) notFound();
  const query = await searchParams;
  const members = await listMembers(actor);
  let result: Awaited<ReturnType<typeof searchAudit>> | null = null;
  let fieldErrors: Record<string, string[]> = {};
  try {
    result = await searchAudit(actor, query);
  } catch (error) {
    if (!isAppError(error)) throw error;
    fieldErrors = error.fieldErrors ?? { _form: [error.message] };
  }
  const csvParams = new URLSearchParams();
  for (const [k, v] of Object.entries(query)) if (v && k !== "page") csvParams.set(k, v);
  csvParams.set("format", "csv");
  const error = (name: string) =>
    fieldErrors[name] ? (
      <span role="alert" className="mt-1 block text-xs text-red-700">
        {fieldErrors[name].join(" ")}
      </span>
    ) : null;
  return (
    <div className="space-y-6">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <div>
          <Link href="/lab" className="text-sm text-copper-700 hover:underline">
            ← Lab settings
          </Link>
          <h1 className="mt-1 text-2xl font-semibold tracking-tight">Audit trail</h1>
          <p className="text-sm text-ink-soft">
            Every action in the lab, append-only: the database refuses to change or delete a line.
          </p>
        </div>
        <a href={`/api/audit?${csvParams.toString()}`} className="btn-quiet">
          Export CSV
        </a>
      </div>
      <form className="flex flex-wrap items-end gap-3 card p-5" aria-label="Filter the audit trail">
        <label className="text-sm">
          <span className="mb-1 label">Member</span>
          <select name="actor" defaultValue={query.actor ?? ""} className="input w-48">
            <option value="">Anyone</option>
            {members.map((m) => (
              <option key={m.id} value={m.id}>
                {m.name}
              </option>
            ))}
          </select>
          {error("actor")}
        </label>
        <label className="text-sm">
          <span className="mb-1 label">Action</span>
          <select name="action" defaultValue={query.action ?? ""} className="input w-56">
            <option value="">Any action</option>
            {(result?.actions ?? []).map((a) => (
              <option key={a} value={a}>
                {a}
              </option>
            ))}
          </select>
          {error("action")}
        </label>
        <label className="text-sm">
          <span className="mb-1 label">Entry id</span>
          <input name="entry" defaultValue={query.entry ?? ""} className="input w-72" />
          {error("entry")}
        </label>
        <label className="text-sm">
          <span className="mb-1 label">From</span>
          <input type="date" name="from" defaultValue={query.from ?? ""} className="input" />
          {error("from")}
        </label>
        <label className="text-sm">
          <span className="mb-1 label">To</span>
          <input type="date" name="to" defaultValue={query.to ?? ""} className="input" />
          {error("to")}
        </label>
        <button type="submit" className="btn-primary">
          Filter
        </button>
        {error("_form")}
        {error("page")}
      </form>
      {result ? (
        <>
          <p className="text-sm text-ink-soft" role="status">
            {result.total} event{result.total === 1 ? "" : "s"} · page {result.page} of{" "}
            {result.pages}
          </p>
          <div className="overflow-x-auto card">
            <table className="w-full text-sm">
              <thead className="text-left text-xs tracking-wide text-ink-soft uppercase">
                <tr>
                  <th scope="col" className="px-4 py-2">
                    When (UTC)
                  </th>
                  <th scope="col" className="px-4 py-2">
                    Who
                  </th>
                  <th scope="col" className="px-4 py-2">
                    Action
                  </th>
                  <th scope="col" className="px-4 py-2">
                    Target
                  </th>
                  <th scope="col" className="px-4 py-2">
                    Details
                  </th>
                </tr>
              </thead>
              <tbody className="divide-y divide-ink/5">
                {result.events.map((e) => (
                  <tr key={e.id}>
                    <td className="px-4 py-2 font-mono text-xs whitespace-nowrap">
                      {e.at.slice(0, 19).replace("T", " ")}
                    </td>
                    <td className="px-4 py-2">{e.actorName}</td>
                    <td className="px-4 py-2 font-mono text-xs">{e.action}</td>
                    <td className="px-4 py-2 text-xs">
                      {e.targetType === "entry" && e.targetId ? (
                        <Link
                          href={`/entries/${e.targetId}`}
                          className="text-copper-700 hover:underline"
                        >
                          entry {e.targetId.slice(0, 8)}
                        </Link>
                      ) : (
                        `${e.targetType} ${e.targetId?.slice(0, 8) ?? ""}`
                      )}
                    </td>
                    <td className="max-w-md px-4 py-2 font-mono text-xs break-all text-ink-soft">
                      {Object.keys(e.details).length ? JSON.stringify(e.details) : ""}
                    </td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
          <nav className="flex gap-3 text-sm" aria-label="Pages">
            {result.page > 1 ? (
              <Link href={withPage(query, result.page - 1)} className="btn-quiet">
                ← Newer
              </Link>
            ) : null}
            {result.page < result.pages ? (
              <Link href={withPage(query, result.page + 1)} className="btn-quiet">
                Older →
              </Link>
            ) : null}
          </nav>
        </>
      ) : null}
    </div>
  );
}
