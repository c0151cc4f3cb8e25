import { Link } from "@/components/ui/link";

export default function JobNotFound() {
  return (
    <div className="flex flex-col gap-3 py-10">
      <p className="font-mono text-reading text-glow">404</p>
      <h1 className="text-title font-bold">No such job in your workshop</h1>
      <p className="max-w-prose text-muted">It may have been deleted, or it belongs to another workshop.</p>
      <Link href="/jobs" className="font-bold text-signal underline underline-offset-4">
        Back to the jobs list
      </Link>
    </div>
  );
}
