"use client";

import Link from "next/link";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { EQUIPMENT_KIND_LABELS, type EquipmentKind } from "@/lib/vocabulary";
import { Button } from "@/components/ui/button";
import { useAction } from "@/components/ui/use-submit";
import { JobForm } from "./job-form";

interface Details {
  id: number;
  title: string;
  equipmentKind: EquipmentKind;
  maker: string | null;
  model: string | null;
  year: number | null;
  customerName: string | null;
  customerEmail: string | null;
  customerId: number | null;
  serialNumber: string | null;
  accessories: string[] | null;
  notes: string | null;
}

export interface IntakePhoto {
  id: number;
  name: string;
  hasThumbnail: boolean;
}

export function JobDetails({
  job,
  canEdit,
  canDelete,
  intakePhotos = [],
}: {
  job: Details;
  canEdit: boolean;
  canDelete: boolean;
  intakePhotos?: IntakePhoto[];
}) {
  const router = useRouter();
  const [editing, setEditing] = useState(false);
  const { run, error } = useAction({ url: `/api/jobs/${job.id}`, method: "DELETE", onDone: () => router.push("/jobs") });
  if (editing) return <JobForm job={job} onDone={() => setEditing(false)} />;
  const rows: [string, React.ReactNode][] = [
    ["Kind", EQUIPMENT_KIND_LABELS[job.equipmentKind]],
    ["Maker", job.maker],
    ["Model", job.model],
    ["Year", job.year ? String(job.year) : null],
    [
      "Customer",
      job.customerId ? (
        <Link href={`/customers/${job.customerId}`} className="font-bold text-signal underline-offset-4 hover:underline">
          {job.customerName}
        </Link>
      ) : (
        job.customerName
      ),
    ],
    ["Customer e-mail", job.customerEmail],
    ["Serial or chassis no.", job.serialNumber ? <span className="font-mono">{job.serialNumber}</span> : null],
    ["Came in with", job.accessories?.length ? job.accessories.join(", ") : null],
  ];
  async function remove() {
    if (!window.confirm(`Delete “${job.title}” with its parts, readings, calculations, files and log? This cannot be undone.`)) return;
    await run();
  }
  return (
    <div>
      <dl className="grid gap-x-6 gap-y-3 sm:grid-cols-2">
        {rows.map(([label, value]) => (
          <div key={label}>
            <dt className="text-note font-bold text-muted">{label}</dt>
            <dd className="break-words">{value ?? <span className="text-muted">—</span>}</dd>
          </div>
        ))}
        {intakePhotos.length ? (
          <div className="sm:col-span-2">
            <dt className="text-note font-bold text-muted">As it came in</dt>
            <dd>
              <ul className="mt-1 flex flex-wrap gap-2" data-testid="intake-photos">
                {intakePhotos.map((f) => (
                  <li key={f.id}>
                    <a
                      href={`/api/jobs/${job.id}/files/${f.id}`}
                      target="_blank"
                      rel="noopener"
                      className="relative block size-20 overflow-hidden rounded-chip border border-rule bg-sunk"
                    >
                      {f.hasThumbnail ? (
                        // eslint-disable-next-line @next/next/no-img-element -- served by our authorised route, not next/image
                        <img src={`/api/jobs/${job.id}/files/${f.id}?thumb=1`} alt={f.name} className="size-full object-cover" />
                      ) : (
                        <span className="sr-only">{f.name}</span>
                      )}
                    </a>
                  </li>
                ))}
              </ul>
            </dd>
          </div>
        ) : null}
        <div className="sm:col-span-2">
          <dt className="text-note font-bold text-muted">Notes</dt>
          <dd className="whitespace-pre-line">{job.notes ?? <span className="text-muted">No notes yet.</span>}</dd>
        </div>
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
              Delete job
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
