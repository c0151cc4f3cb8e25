import { Link } from "@/components/ui/link";

export default function CustomerNotFound() {
  return (
    <div className="flex flex-col gap-3 py-10">
      <p className="font-mono text-reading text-glow">404</p>
      <h1 className="text-title font-bold">No such customer in your workshop</h1>
      <p className="max-w-prose text-muted">They may have been removed, or they are another workshop&rsquo;s.</p>
      <Link href="/customers" className="font-bold text-signal underline underline-offset-4">
        Back to the customers
      </Link>
    </div>
  );
}
