"use client";

import { EQUIPMENT_KINDS, EQUIPMENT_KIND_LABELS, JOB_STATUSES, JOB_STATUS_LABELS } from "@/lib/vocabulary";

export interface Filters {
  q: string;
  status: string;
  kind: string;
}

const control = "min-h-11 rounded-chip border border-edge bg-panel px-3 py-2 text-body text-ink";

export function JobFilters({ value, onChange }: { value: Filters; onChange: (f: Filters) => void }) {
  return (
    <div role="search" className="flex flex-wrap items-end gap-3 rounded-card border border-rule bg-panel p-4">
      <label className="flex min-w-56 flex-1 flex-col gap-1">
        <span className="text-note font-bold">Search</span>
        <input
          type="search"
          value={value.q}
          onChange={(e) => onChange({ ...value, q: e.target.value })}
          placeholder="Title, maker, model or customer"
          className={control}
        />
      </label>
      <label className="flex flex-col gap-1">
        <span className="text-note font-bold">Status</span>
        <select value={value.status} onChange={(e) => onChange({ ...value, status: e.target.value })} className={control}>
          <option value="">All statuses</option>
          <option value={JOB_STATUSES.filter((s) => s !== "returned").join(",")}>Still in the shop</option>
          {JOB_STATUSES.map((s) => (
            <option key={s} value={s}>
              {JOB_STATUS_LABELS[s]}
            </option>
          ))}
        </select>
      </label>
      <label className="flex flex-col gap-1">
        <span className="text-note font-bold">Kind</span>
        <select value={value.kind} onChange={(e) => onChange({ ...value, kind: e.target.value })} className={control}>
          <option value="">All kinds</option>
          {EQUIPMENT_KINDS.map((k) => (
            <option key={k} value={k}>
              {EQUIPMENT_KIND_LABELS[k]}
            </option>
          ))}
        </select>
      </label>
      {value.q || value.status || value.kind ? (
        <button
          type="button"
          className="min-h-11 rounded-chip px-3 font-bold text-signal hover:bg-sunk"
          onClick={() => onChange({ q: "", status: "", kind: "" })}
        >
          Clear
        </button>
      ) : null}
    </div>
  );
}
