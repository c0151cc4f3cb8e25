import type { Metadata } from "next";
import { RemoveButton } from "@/components/jobs/remove-button";
import { FileUploadForm } from "@/components/jobs/file-upload-form";
import { loadJobPage, type JobPageProps } from "@/components/jobs/load-job";
import { Card, EmptyState } from "@/components/ui/card";
import { listFiles } from "@/db/queries/files";
import { can } from "@/lib/auth/can";
import { formatDate } from "@/lib/jobs/dates";
import { FILE_KIND_LABELS } from "@/lib/vocabulary";

export const metadata: Metadata = { title: "Files" };

const size = (n: number) => (n >= 1024 * 1024 ? `${(n / 1024 / 1024).toFixed(1)} MB` : `${Math.max(1, Math.round(n / 1024))} kB`);

export default async function FilesPage({ params }: JobPageProps) {
  const { member, job } = await loadJobPage((await params).id, "files");
  const files = listFiles(member, job.id);
  const canEdit = can.editJobs(member);
  const url = (id: number, q = "") => `/api/jobs/${job.id}/files/${id}${q}`;
  return (
    <div className="flex flex-col gap-6">
      {canEdit ? (
        <Card>
          <h2 className="mb-3 text-lead font-bold">Attach a photo or schematic</h2>
          <FileUploadForm jobId={job.id} />
        </Card>
      ) : null}
      {files.length === 0 ? (
        <EmptyState title="No photos or schematics yet">
          {canEdit
            ? "Photograph the chassis before you start — it settles where every lead went. Attach the schematic too."
            : "Technicians attach photos of the chassis and the schematic here."}
        </EmptyState>
      ) : (
        <ul className="grid gap-4 sm:grid-cols-2 lg:grid-cols-3" data-testid="files">
          {files.map((f) => (
            <li key={f.id} className="flex flex-col overflow-hidden rounded-card border border-rule bg-panel shadow-card">
              <a href={url(f.id)} target="_blank" rel="noopener" className="flex aspect-[4/3] items-center justify-center bg-sunk">
                {f.hasThumbnail ? (
                  // eslint-disable-next-line @next/next/no-img-element -- served by our authorised route, not next/image
                  <img src={url(f.id, "?thumb=1")} alt={f.originalName} className="h-full w-full object-cover" />
                ) : (
                  <span className="font-mono text-reading text-muted">PDF</span>
                )}
              </a>
              <div className="flex flex-1 flex-col gap-1 p-3">
                <p className="truncate font-bold" title={f.originalName}>
                  {f.originalName}
                </p>
                <p className="text-note text-muted">
                  <span>{FILE_KIND_LABELS[f.kind]}</span> · {size(f.size)} · {formatDate(f.createdAt)}
                  {f.uploaderName ? ` · ${f.uploaderName}` : ""}
                </p>
                <div className="mt-auto flex items-center justify-between pt-2">
                  <a href={url(f.id, "?download=1")} className="text-note font-bold text-signal underline underline-offset-4">
                    Download
                  </a>
                  {canEdit ? <RemoveButton url={url(f.id)} confirm={`Remove ${f.originalName}?`} label={`Remove ${f.originalName}`} /> : null}
                </div>
              </div>
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
