"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { useAction } from "@/components/ui/use-submit";
import { CustomerForm } from "./customer-form";

interface Details {
  id: number;
  name: string;
  email: string | null;
  phone: string | null;
  address: string | null;
  notes: string | null;
}

/** A customer's contact details, edited in place by technicians and owners; an owner may remove one with no jobs. */
export function CustomerDetails({ customer, canEdit, canDelete }: { customer: Details; canEdit: boolean; canDelete: boolean }) {
  const router = useRouter();
  const [editing, setEditing] = useState(false);
  const { run, error } = useAction({ url: `/api/customers/${customer.id}`, method: "DELETE", onDone: () => router.push("/customers") });
  if (editing) return <CustomerForm customer={customer} onDone={() => setEditing(false)} />;
  async function remove() {
    if (!window.confirm(`Remove ${customer.name} from the customer list?`)) return;
    await run();
  }
  const rows: [string, React.ReactNode][] = [
    [
      "E-mail",
      customer.email ? (
        <a href={`mailto:${customer.email}`} className="break-all text-signal underline underline-offset-4">
          {customer.email}
        </a>
      ) : null,
    ],
    [
      "Phone",
      customer.phone ? (
        <a href={`tel:${customer.phone.replace(/[^\d+]/g, "")}`} className="text-signal underline underline-offset-4">
          {customer.phone}
        </a>
      ) : null,
    ],
    ["Address", customer.address],
    ["Notes", customer.notes],
  ];
  return (
    <div>
      <dl className="grid gap-x-6 gap-y-3 sm:grid-cols-2">
        {rows.map(([label, value]) => (
          <div key={label} className={label === "Notes" || label === "Address" ? "sm:col-span-2" : undefined}>
            <dt className="text-note font-bold text-muted">{label}</dt>
            <dd className="whitespace-pre-line break-words">{value ?? <span className="text-muted">—</span>}</dd>
          </div>
        ))}
      </dl>
      {canEdit || canDelete ? (
        <div className="mt-5 flex flex-wrap gap-3">
          {canEdit ? (
            <Button variant="secondary" onClick={() => setEditing(true)}>
              Edit details
            </Button>
          ) : null}
          {canDelete ? (
            <Button variant="destructive" onClick={remove}>
              Remove customer
            </Button>
          ) : null}
        </div>
      ) : null}
      <p role="alert" className="mt-2 min-h-5 font-bold text-flag">
        {error ?? ""}
      </p>
    </div>
  );
}
