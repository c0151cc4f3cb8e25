"use client";

import { useQuery } from "@tanstack/react-query";
import { useEffect, useState, type ReactNode } from "react";
import { getJson } from "@/lib/client/fetch-json";

export type PickedCustomer = { id: number; name: string; email: string | null } | null;
type Found = { id: number; name: string; email: string | null; phone: string | null; jobCount: number };

function useDebounced<T>(value: T, ms: number): T {
  const [v, setV] = useState(value);
  useEffect(() => {
    const t = setTimeout(() => setV(value), ms);
    return () => clearTimeout(t);
  }, [value, ms]);
  return v;
}

/**
 * Booking a set in: pick a customer on file (search by name, e-mail or phone), or type a new one in the
 * fields passed as `newCustomer`; with neither, the set is the workshop's own. The server finds a typed
 * e-mail or name on file before it makes a new record, so typing an old customer's details is harmless.
 */
export function CustomerPicker({ picked, onPick, newCustomer }: { picked: PickedCustomer; onPick: (c: PickedCustomer) => void; newCustomer: ReactNode }) {
  const [text, setText] = useState("");
  const q = useDebounced(text.trim(), 250);
  const found = useQuery({
    queryKey: ["customers", q],
    queryFn: () => getJson<{ customers: Found[] }>(`/api/customers?q=${encodeURIComponent(q)}`),
    enabled: q.length > 0 && !picked,
  });
  if (picked) {
    return (
      <div className="flex flex-wrap items-center gap-3 rounded-card border border-rule bg-sunk/50 p-3" data-testid="picked-customer">
        <div className="min-w-0 flex-1">
          <p className="font-bold break-words">{picked.name}</p>
          {picked.email ? <p className="text-note text-muted break-all">{picked.email}</p> : null}
        </div>
        <button type="button" className="min-h-11 rounded-chip border border-rule bg-panel px-4 font-bold hover:bg-sunk" onClick={() => onPick(null)}>
          Change
        </button>
      </div>
    );
  }
  const list = found.data?.customers.slice(0, 6) ?? [];
  return (
    <div className="flex flex-col gap-3">
      <label className="flex flex-col gap-1">
        <span className="font-bold">Customer on file</span>
        <input
          type="search"
          value={text}
          onChange={(e) => setText(e.target.value)}
          placeholder="Find by name, e-mail or phone"
          className="min-h-11 w-full rounded-chip border border-edge bg-panel px-3 py-2"
          aria-describedby="customer-search-note"
        />
      </label>
      {q ? (
        <ul className="flex flex-col gap-2" aria-label="Customers found" aria-busy={found.isFetching}>
          {list.map((c) => (
            <li key={c.id}>
              <button
                type="button"
                className="flex min-h-11 w-full flex-col items-start rounded-chip border border-rule bg-panel px-3 py-2 text-left hover:bg-sunk"
                onClick={() => onPick({ id: c.id, name: c.name, email: c.email })}
              >
                <span className="font-bold break-words">{c.name}</span>
                <span className="text-note text-muted break-all">
                  {[c.email, c.phone, `${c.jobCount} job${c.jobCount === 1 ? "" : "s"}`].filter(Boolean).join(" · ")}
                </span>
              </button>
            </li>
          ))}
          {found.data && list.length === 0 ? <li className="text-muted">Nobody on file matches; type them in as a new customer below.</li> : null}
        </ul>
      ) : null}
      <p id="customer-search-note" className="text-note text-muted">
        Or a new customer (leave blank for the workshop&rsquo;s own set):
      </p>
      <div className="grid grid-cols-1 gap-x-4 gap-y-1 sm:grid-cols-2">{newCustomer}</div>
    </div>
  );
}
