"use client";

import { Detail, DetailsActions, useEditOrRemove } from "@/components/ui/record-details";
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
  const { editing, setEditing, remove, error } = useEditOrRemove({
    url: `/api/customers/${customer.id}`,
    list: "/customers",
    question: `Remove ${customer.name} from the customer list?`,
  });
  if (editing) return <CustomerForm customer={customer} onDone={() => setEditing(false)} />;
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
          <Detail key={label} label={label} wide={label === "Notes" || label === "Address"} className="whitespace-pre-line break-words">
            {value}
          </Detail>
        ))}
      </dl>
      <DetailsActions canEdit={canEdit} canDelete={canDelete} onEdit={() => setEditing(true)} onDelete={remove} deleteLabel="Remove customer" error={error} />
    </div>
  );
}
