"use client";

import { keepPreviousData, useQuery } from "@tanstack/react-query";
import { createColumnHelper, flexRender, getCoreRowModel, useReactTable, type SortingState } from "@tanstack/react-table";
import { Link } from "@/components/ui/link";
import { useEffect, useState } from "react";
import { EQUIPMENT_KIND_LABELS, type EquipmentKind, type JobStatus } from "@/lib/vocabulary";
import { EmptyState } from "@/components/ui/card";
import { getJson } from "@/lib/client/fetch-json";
import { formatDate } from "@/lib/jobs/dates";
import { JOB_LIST_PAGE_SIZE } from "@/lib/jobs/job-list-size";
import { JobFilters, type Filters } from "./job-filters";
import { StatusBadge } from "./status-badge";

export interface JobListItem {
  id: number;
  number: number;
  title: string;
  equipmentKind: EquipmentKind;
  maker: string | null;
  model: string | null;
  year: number | null;
  customerName: string | null;
  status: JobStatus;
  updatedAt: string;
}
export interface JobPage {
  jobs: JobListItem[];
  total: number;
  page: number;
  pageSize: number;
}

const PAGE_SIZE = JOB_LIST_PAGE_SIZE;
const col = createColumnHelper<JobListItem>();
const columns = [
  col.accessor("title", {
    header: "Set",
    cell: ({ row }) => (
      <div>
        <Link href={`/jobs/${row.original.id}`} className="font-bold text-ink underline-offset-4 hover:underline">
          {row.original.title}
        </Link>
        <div className="text-note text-muted">
          {[`Job ${row.original.number}`, row.original.maker, row.original.model, row.original.year].filter(Boolean).join(" · ")}
        </div>
      </div>
    ),
  }),
  col.accessor("equipmentKind", { header: "Kind", cell: (c) => EQUIPMENT_KIND_LABELS[c.getValue()] }),
  col.accessor("customerName", { header: "Customer", cell: (c) => c.getValue() ?? <span className="text-muted">Workshop</span> }),
  col.accessor("status", { header: "Status", cell: (c) => <StatusBadge status={c.getValue()} /> }),
  col.accessor("updatedAt", { header: "Last worked on", cell: (c) => <span className="font-mono text-note">{formatDate(c.getValue())}</span> }),
];

function useDebounced<T>(value: T, ms: number): T {
  const [v, setV] = useState(value);
  useEffect(() => {
    const t = setTimeout(() => setV(value), ms);
    return () => clearTimeout(t);
  }, [value, ms]);
  return v;
}

/** `firstPage` is the unfiltered first page, rendered on the server so the list shows without waiting. */
export function JobList({ firstPage }: { firstPage?: JobPage }) {
  const [filters, setFilters] = useState<Filters>({ q: "", status: "", kind: "" });
  const [sorting, setSorting] = useState<SortingState>([{ id: "updatedAt", desc: true }]);
  const [page, setPage] = useState(1);
  const q = useDebounced(filters.q.trim(), 250);
  useEffect(() => setPage(1), [q, filters.status, filters.kind, sorting]);

  const params = new URLSearchParams({ page: String(page), pageSize: String(PAGE_SIZE) });
  if (sorting[0]) {
    params.set("sort", sorting[0].id);
    params.set("dir", sorting[0].desc ? "desc" : "asc");
  }
  if (q) params.set("q", q);
  if (filters.status) params.set("status", filters.status);
  if (filters.kind) params.set("kind", filters.kind);
  const isFirst = page === 1 && !q && !filters.status && !filters.kind && sorting[0]?.id === "updatedAt" && sorting[0]?.desc;
  const query = useQuery({
    queryKey: ["jobs", params.toString()],
    queryFn: () => getJson<JobPage>(`/api/jobs?${params}`),
    placeholderData: keepPreviousData,
    initialData: isFirst ? firstPage : undefined,
  });

  const data = query.data;
  const table = useReactTable({
    data: data?.jobs ?? [],
    columns,
    state: { sorting },
    onSortingChange: setSorting,
    manualSorting: true,
    manualPagination: true,
    enableSortingRemoval: false,
    rowCount: data?.total ?? 0,
    getCoreRowModel: getCoreRowModel(),
  });
  const filtered = !!(q || filters.status || filters.kind);
  const pages = data ? Math.max(1, Math.ceil(data.total / PAGE_SIZE)) : 1;
  const first = data && data.total ? (page - 1) * PAGE_SIZE + 1 : 0;

  return (
    <div className="flex flex-col gap-4">
      <JobFilters value={filters} onChange={setFilters} />
      {query.isError ? (
        <p role="alert" className="rounded-card border border-flag bg-flag-bg p-4 font-bold text-flag">
          {query.error.message}{" "}
          <button type="button" className="underline" onClick={() => query.refetch()}>
            Try again
          </button>
        </p>
      ) : null}
      {data && data.total === 0 ? (
        filtered ? (
          <EmptyState title="No jobs match">Clear the search or choose another status or kind to see more sets.</EmptyState>
        ) : (
          <EmptyState title="No sets on the bench yet">Book in the first set with the button above to start its record.</EmptyState>
        )
      ) : (
        <div className="overflow-x-auto rounded-card border border-rule bg-panel shadow-card">
          <table className="gb-stack w-full min-w-[44rem] border-collapse text-left" aria-busy={query.isFetching} data-testid="job-table">
            <thead className="border-b border-rule bg-sunk/60">
              {table.getHeaderGroups().map((hg) => (
                <tr key={hg.id}>
                  {hg.headers.map((h) => {
                    const sorted = h.column.getIsSorted();
                    return (
                      <th
                        key={h.id}
                        scope="col"
                        aria-sort={sorted ? (sorted === "asc" ? "ascending" : "descending") : "none"}
                        className="px-4 py-2 text-note font-bold uppercase tracking-wide text-muted"
                      >
                        <button type="button" className="inline-flex min-h-11 items-center gap-1 hover:text-ink" onClick={h.column.getToggleSortingHandler()}>
                          {flexRender(h.column.columnDef.header, h.getContext())}
                          <span aria-hidden="true" className="font-mono">
                            {sorted === "asc" ? "▲" : sorted === "desc" ? "▼" : "↕"}
                          </span>
                        </button>
                      </th>
                    );
                  })}
                </tr>
              ))}
            </thead>
            <tbody className="divide-y divide-rule">
              {table.getRowModel().rows.map((row) => (
                <tr key={row.id} className="hover:bg-sunk/40">
                  {row.getVisibleCells().map((cell) => (
                    <td
                      key={cell.id}
                      className="px-4 py-3 align-middle"
                      data-label={cell.column.id === "title" ? undefined : String(cell.column.columnDef.header)}
                    >
                      {flexRender(cell.column.columnDef.cell, cell.getContext())}
                    </td>
                  ))}
                </tr>
              ))}
              {!data ? (
                <tr>
                  <td colSpan={columns.length} className="px-4 py-10 text-center text-muted">
                    Loading jobs…
                  </td>
                </tr>
              ) : null}
            </tbody>
          </table>
        </div>
      )}
      {data && data.total > 0 ? (
        <nav aria-label="Pages" className="flex flex-wrap items-center justify-between gap-3">
          <p className="text-muted" aria-live="polite">
            {first}–{first + data.jobs.length - 1} of {data.total} {data.total === 1 ? "job" : "jobs"}
          </p>
          <div className="flex items-center gap-2">
            <button
              type="button"
              className="min-h-11 rounded-chip border border-rule bg-panel px-4 font-bold disabled:opacity-50"
              disabled={page <= 1}
              onClick={() => setPage((p) => p - 1)}
            >
              Previous
            </button>
            <span className="font-mono text-note">
              {page} / {pages}
            </span>
            <button
              type="button"
              className="min-h-11 rounded-chip border border-rule bg-panel px-4 font-bold disabled:opacity-50"
              disabled={page >= pages}
              onClick={() => setPage((p) => p + 1)}
            >
              Next
            </button>
          </div>
        </nav>
      ) : null}
    </div>
  );
}
