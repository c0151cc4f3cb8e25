"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { EQUIPMENT_KIND_LABELS, type EquipmentKind } from "@/lib/vocabulary";
import { Button } from "@/components/ui/button";
import { sendJson } from "@/lib/client/fetch-json";
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
  notes: string | null;
}

export function JobDetails({ job, canEdit, canDelete }: { job: Details; canEdit: boolean; canDelete: boolean }) {
  const router = useRouter();
  const [editing, setEditing] = useState(false);
  const [error, setError] = useState<string | null>(null);
  if (editing) return <JobForm job={job} onDone={() => setEditing(false)} />;
  const rows: [string, string | null][] = [
    ["Kind", EQUIPMENT_KIND_LABELS[job.equipmentKind]],
    ["Maker", job.maker],
    ["Model", job.model],
    ["Year", job.year ? String(job.year) : null],
    ["Customer", job.customerName],
    ["Customer e-mail", job.customerEmail],
  ];
  async function remove() {
    if (!window.confirm(`Delete “${job.title}” with its parts, readings, calculations, files and log? This cannot be undone.`)) return;
    const res = await sendJson(`/api/jobs/${job.id}`, undefined, "DELETE");
    if (!res.ok) return setError(res.message);
    router.push("/jobs");
    router.refresh();
  }
  return (
    <div>
      <dl className="grid gap-x-6 gap-y-3 sm:grid-cols-2">
        {rows.map(([label, value]) => (
          <div key={label}>
            <dt className="text-note font-bold text-muted">{label}</dt>
            <dd>{value ?? <span className="text-muted">—</span>}</dd>
          </div>
        ))}
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
