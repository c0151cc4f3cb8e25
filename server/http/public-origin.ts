import "server-only";
/** The address links in e-mails and payment redirects point at: GLOWBENCH_PUBLIC_URL, else this request's origin. */
export function publicOrigin(request: Request): string {
  const configured = process.env.GLOWBENCH_PUBLIC_URL;
  if (configured) return configured.replace(/\/+$/, "");
  return new URL(request.url).origin;
}
