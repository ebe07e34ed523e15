"use client";
import Link from "next/link";
import { useQuery } from "@tanstack/react-query";
import { useMemo, useState } from "react";
import { apiFetch } from "@/lib/ui/api-client";
import { StatusChip } from "./status-chip";
import type { EntryListResponse } from "@/lib/contract/entries";
import { ENTRY_STATUS_LABELS, ENTRY_STATUSES } from "@/lib/contract/vocabulary";

type SortKey = "updatedAt" | "createdAt" | "title" | "status";

const COLUMNS: { key: SortKey | null; label: string }[] = [
  { key: "title", label: "Title" },
  { key: null, label: "Project" },
  { key: null, label: "Author" },
  { key: "status", label: "Status" },
  { key: "createdAt", label: "Created" },
  { key: "updatedAt", label: "Last saved" },
];

const when = (iso: string) =>
  new Date(iso).toLocaleString("en-GB", { dateStyle: "medium", timeStyle: "short" });

/** The entries list: filters and sorting run on the server (route handler), fetched with react-query. */
export function EntryTable({ projects }: { projects: { id: string; name: string }[] }) {
  const [projectId, setProjectId] = useState("");
  const [status, setStatus] = useState("");
  const [mine, setMine] = useState(false);
  const [search, setSearch] = useState("");
  const [archived, setArchived] = useState(false);
  const [sort, setSort] = useState<{ key: SortKey; order: "asc" | "desc" }>({
    key: "updatedAt",
    order: "desc",
  });

  const params = useMemo(() => {
    const p = new URLSearchParams({
      sort: sort.key,
      order: sort.order,
      author: mine ? "me" : "anyone",
      archived: String(archived),
    });
    if (projectId) p.set("projectId", projectId);
    if (status) p.set("status", status);
    if (search.trim()) p.set("q", search.trim());
    return p.toString();
  }, [projectId, status, mine, search, archived, sort]);

  const { data, error, isLoading } = useQuery({
    queryKey: ["entries", params],
    queryFn: () => apiFetch<EntryListResponse>(`/api/entries?${params}`),
  });

  const toggleSort = (key: SortKey) =>
    setSort((s) =>
      s.key === key
        ? { key, order: s.order === "asc" ? "desc" : "asc" }
        : { key, order: key === "title" ? "asc" : "desc" },
    );

  return (
    <div className="space-y-4">
      <div className="flex flex-wrap items-end gap-3" role="search" aria-label="Filter entries">
        <label className="text-sm">
          <span className="mb-1 label">Title contains</span>
          <input
            className="input w-56"
            value={search}
            onChange={(e) => setSearch(e.target.value)}
            placeholder="e.g. ferrocyanide"
          />
        </label>
        <label className="text-sm">
          <span className="mb-1 label">Project</span>
          <select
            className="input w-56"
            value={projectId}
            onChange={(e) => setProjectId(e.target.value)}
          >
            <option value="">All projects</option>
            {projects.map((p) => (
              <option key={p.id} value={p.id}>
                {p.name}
              </option>
            ))}
          </select>
        </label>
        <label className="text-sm">
          <span className="mb-1 label">Status</span>
          <select className="input w-40" value={status} onChange={(e) => setStatus(e.target.value)}>
            <option value="">Any status</option>
            {ENTRY_STATUSES.map((s) => (
              <option key={s} value={s}>
                {ENTRY_STATUS_LABELS[s]}
              </option>
            ))}
          </select>
        </label>
        <label className="flex items-center gap-2 pb-2 text-sm">
          <input type="checkbox" checked={mine} onChange={(e) => setMine(e.target.checked)} /> Only
          mine
        </label>
        <label className="flex items-center gap-2 pb-2 text-sm">
          <input
            type="checkbox"
            checked={archived}
            onChange={(e) => setArchived(e.target.checked)}
          />{" "}
          Archived
        </label>
      </div>

      <div className="overflow-x-auto card">
        <table className="w-full text-sm" aria-label="Entries">
          <thead className="border-b border-ink/10 text-left text-xs tracking-wide text-ink-soft uppercase">
            <tr>
              {COLUMNS.map((c) => (
                <th
                  key={c.label}
                  className="px-4 py-2.5 font-medium"
                  aria-sort={
                    c.key && sort.key === c.key
                      ? sort.order === "asc"
                        ? "ascending"
                        : "descending"
                      : undefined
                  }
                >
                  {c.key ? (
                    <button
                      type="button"
                      onClick={() => toggleSort(c.key as SortKey)}
                      className="inline-flex items-center gap-1 uppercase hover:text-ink"
                    >
                      {c.label}
                      <span aria-hidden="true">
                        {sort.key === c.key ? (sort.order === "asc" ? "▲" : "▼") : "↕"}
                      </span>
                    </button>
                  ) : (
                    c.label
                  )}
                </th>
              ))}
            </tr>
          </thead>
          <tbody className="divide-y divide-ink/5">
            {isLoading ? (
              <tr>
                <td colSpan={6} className="px-4 py-6 text-ink-soft">
                  Loading entries…
                </td>
              </tr>
            ) : null}
            {error ? (
              <tr>
                <td colSpan={6} role="alert" className="px-4 py-6 text-red-700">
                  {error.message}
                </td>
              </tr>
            ) : null}
            {data && data.entries.length === 0 ? (
              <tr>
                <td colSpan={6} className="px-4 py-6 text-ink-soft">
                  No entries match these filters.
                </td>
              </tr>
            ) : null}
            {data?.entries.map((e) => (
              <tr key={e.id} className="hover:bg-copper-50/40">
                <td className="px-4 py-2.5 font-medium">
                  <Link href={`/entries/${e.id}`} className="hover:text-copper-700 hover:underline">
                    {e.title}
                  </Link>
                </td>
                <td className="px-4 py-2.5 text-ink-soft">{e.projectName}</td>
                <td className="px-4 py-2.5 text-ink-soft">{e.authorName}</td>
                <td className="px-4 py-2.5">
                  <StatusChip status={e.status} />
                </td>
                <td className="px-4 py-2.5 font-mono text-xs text-ink-soft tabular">
                  {when(e.createdAt)}
                </td>
                <td className="px-4 py-2.5 font-mono text-xs text-ink-soft tabular">
                  {when(e.updatedAt)} · r{e.revision}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}
