import type { WorkshopSettings } from "@/db/queries/workshop";

export function ContactDetails({ settings }: { settings: WorkshopSettings }) {
  const rows = [
    ["E-mail", settings.contactEmail],
    ["Phone", settings.contactPhone],
    ["Address", settings.address],
  ] as const;
  if (rows.every(([, v]) => !v)) return <p className="text-muted">No contact details yet. The workshop owner can add them here.</p>;
  return (
    <dl className="grid grid-cols-[6rem_1fr] gap-y-2">
      {rows.map(([label, value]) => (
        <div key={label} className="contents">
          <dt className="font-bold">{label}</dt>
          <dd className={value ? "" : "text-muted"}>{value ?? "—"}</dd>
        </div>
      ))}
    </dl>
  );
}
