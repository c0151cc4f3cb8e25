"use client";

import { Link } from "@/components/ui/link";
import { EQUIPMENT_KIND_LABELS, type EquipmentKind } from "@/lib/vocabulary";
import { Detail, DetailsActions, useEditOrRemove } from "@/components/ui/record-details";
import { LazyJobForm as JobForm } from "./lazy-forms";

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
  const { editing, setEditing, remove, error } = useEditOrRemove({
    url: `/api/jobs/${job.id}`,
    list: "/jobs",
    invalidate: [["jobs"]],
    question: `Delete “${job.title}” with its parts, readings, calculations, files and log? This cannot be undone.`,
  });
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
  return (
    <div>
      <dl className="grid gap-x-6 gap-y-3 sm:grid-cols-2">
        {rows.map(([label, value]) => (
          <Detail key={label} label={label} className="break-words">
            {value}
          </Detail>
        ))}
        {intakePhotos.length ? (
          <Detail label="As it came in" wide>
            <IntakePhotoStrip jobId={job.id} photos={intakePhotos} />
          </Detail>
        ) : null}
        <Detail label="Notes" wide className="whitespace-pre-line">
          {job.notes ?? <span className="text-muted">No notes yet.</span>}
        </Detail>
      </dl>
      <DetailsActions canEdit={canEdit} canDelete={canDelete} onEdit={() => setEditing(true)} onDelete={remove} deleteLabel="Delete job" error={error} />
    </div>
  );
}

/** The intake photos as thumbnails, each opening the full picture from the job's Files. */
function IntakePhotoStrip({ jobId, photos }: { jobId: number; photos: IntakePhoto[] }) {
  return (
    <ul className="mt-1 flex flex-wrap gap-2" data-testid="intake-photos">
      {photos.map((f) => (
        <li key={f.id}>
          <a
            href={`/api/jobs/${jobId}/files/${f.id}`}
            target="_blank"
            rel="noopener"
            className="relative block size-20 overflow-hidden rounded-chip border border-rule bg-sunk"
          >
            {f.hasThumbnail ? (
              // eslint-disable-next-line @next/next/no-img-element -- served by our authorised route, not next/image
              <img src={`/api/jobs/${jobId}/files/${f.id}?thumb=1`} alt={f.name} className="size-full object-cover" />
            ) : (
              <span className="sr-only">{f.name}</span>
            )}
          </a>
        </li>
      ))}
    </ul>
  );
}
