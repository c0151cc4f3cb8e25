/** A Content-Disposition value that survives any file name: an ASCII fallback plus RFC 6266 / 5987 UTF-8. */
export function downloadName(disposition: "inline" | "attachment", name: string): string {
  const ascii = name.replace(/[^\x20-\x7e]/g, "_").replace(/["\\;]/g, "_") || "download";
  return `${disposition}; filename="${ascii}"; filename*=UTF-8''${encodeURIComponent(name)}`;
}
