"use client";

import { useState } from "react";

/** What usually comes in with a set, as one-tap choices; anything else is typed. Our own list (common practice). */
export const COMMON_ACCESSORIES = ["Knobs", "Back cover", "Manual", "Power cord", "Dial glass", "Speaker", "Spare tubes"] as const;

/**
 * The "came in with" list for the job form: checkboxes for the common items and a text field for the rest.
 * Controlled: `value` is the list, `onChange` gets the new list.
 */
export function AccessoriesField({ value, onChange, error }: { value: string[]; onChange: (v: string[]) => void; error?: string }) {
  const isCommon = (x: string) => COMMON_ACCESSORIES.some((c) => c.toLowerCase() === x.toLowerCase());
  const [other, setOther] = useState(value.filter((x) => !isCommon(x)).join(", "));
  const ticked = value.filter(isCommon);
  const merge = (commons: string[], otherText: string) => [
    ...commons,
    ...otherText
      .split(",")
      .map((x) => x.trim())
      .filter(Boolean),
  ];
  const toggle = (item: string, on: boolean) => onChange(merge(on ? [...ticked, item] : ticked.filter((x) => x.toLowerCase() !== item.toLowerCase()), other));
  return (
    <fieldset className="flex min-w-0 flex-col gap-2" aria-describedby={error ? "job-accessories-error" : undefined}>
      <legend className="mb-1 font-bold">Came in with</legend>
      <div className="flex flex-wrap gap-x-4">
        {COMMON_ACCESSORIES.map((item) => (
          <label key={item} className="inline-flex min-h-11 items-center gap-2">
            <input
              type="checkbox"
              className="size-5 accent-glow"
              checked={ticked.some((x) => x.toLowerCase() === item.toLowerCase())}
              onChange={(e) => toggle(item, e.target.checked)}
            />
            {item}
          </label>
        ))}
      </div>
      <label className="flex flex-col gap-1">
        <span className="text-note font-bold text-muted">Anything else (separate with commas)</span>
        <input
          value={other}
          onChange={(e) => {
            setOther(e.target.value);
            onChange(merge(ticked, e.target.value));
          }}
          placeholder="Original carton, service receipt"
          className="min-h-11 w-full rounded-chip border border-edge bg-panel px-3 py-2"
        />
      </label>
      {error ? (
        <p id="job-accessories-error" role="alert" className="text-note font-bold text-flag">
          {error}
        </p>
      ) : null}
    </fieldset>
  );
}

/** Photos of the set as it came in, chosen when booking in; the form uploads them once the job exists. */
export function IntakePhotosField({ onChange }: { onChange: (photos: File[]) => void }) {
  return (
    <label className="flex flex-col gap-1 sm:col-span-2">
      <span className="font-bold">Intake photos</span>
      <input
        type="file"
        accept="image/jpeg,image/png,image/webp"
        capture="environment"
        multiple
        onChange={(e) => onChange([...(e.target.files ?? [])])}
        aria-describedby="job-photos-hint"
        className="min-h-11 w-full min-w-0 rounded-chip border border-edge bg-panel px-3 py-2 file:mr-3 file:rounded-chip file:border-0 file:bg-sunk file:px-3 file:py-1 file:font-bold"
      />
      <span id="job-photos-hint" className="text-note text-muted">
        The set as it came in: cabinet, back, chassis. JPEG, PNG or WebP, up to 20 MB each; they go to the job&rsquo;s Files.
      </span>
    </label>
  );
}
