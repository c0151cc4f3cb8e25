"use client";

import { useRef, useState } from "react";
import { Button } from "@/components/ui/button";
import { useAction } from "@/components/ui/use-submit";

/** Multipart upload of one photo or schematic; the server sniffs the type and answers in plain words. */
export function FileUploadForm({ jobId }: { jobId: number }) {
  const form = useRef<HTMLFormElement>(null);
  const [error, setError] = useState<string | null>(null);
  const { run, pending: busy } = useAction({
    url: `/api/jobs/${jobId}/files`,
    onDone: () => form.current?.reset(),
    // The server's word on the file goes after its message; a body that is not ours reads as an upload failure.
    onFail: (f) =>
      setError(f.fields.file ? `${f.message} ${f.fields.file}` : f.message === `Request failed (${f.status}).` ? `Upload failed (${f.status}).` : f.message),
  });
  async function onSubmit(e: React.FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const data = new FormData(e.currentTarget);
    const file = data.get("file");
    if (!(file instanceof File) || file.size === 0) return setError("Choose a photo or schematic first.");
    if (file.size > 20 * 1024 * 1024) return setError("Files may be up to 20 MB; export a smaller copy.");
    setError(null);
    await run(data);
  }
  return (
    <form ref={form} onSubmit={onSubmit} className="flex flex-wrap items-end gap-4" aria-describedby="upload-error upload-hint">
      <label className="flex w-full min-w-0 flex-col gap-1 sm:w-auto">
        <span className="font-bold">File</span>
        <input
          name="file"
          type="file"
          accept="image/jpeg,image/png,image/webp,application/pdf"
          className="min-h-11 w-full min-w-0 rounded-chip border border-edge bg-panel px-3 py-2 file:mr-3 file:rounded-chip file:border-0 file:bg-sunk file:px-3 file:py-1 file:font-bold"
        />
      </label>
      <fieldset className="flex flex-wrap gap-x-4">
        <legend className="mb-1 font-bold">It is a</legend>
        <label className="inline-flex min-h-11 items-center gap-2">
          <input type="radio" name="kind" value="photo" defaultChecked /> Photo
        </label>
        <label className="inline-flex min-h-11 items-center gap-2">
          <input type="radio" name="kind" value="schematic" /> Schematic
        </label>
        <label className="inline-flex min-h-11 items-center gap-2">
          <input type="radio" name="kind" value="intake" /> Intake photo
        </label>
      </fieldset>
      <Button type="submit" disabled={busy}>
        {busy ? "Uploading…" : "Attach"}
      </Button>
      <p id="upload-hint" className="w-full text-note text-muted">
        JPEG, PNG or WebP photos; PDF or image schematics; up to 20 MB. The type is read from the file itself.
      </p>
      <p id="upload-error" role="alert" aria-live="polite" className="w-full min-h-5 font-bold text-flag">
        {error ?? ""}
      </p>
    </form>
  );
}
