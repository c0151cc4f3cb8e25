import { Link } from "@/components/ui/link";

export default function WorkshopNotFound() {
  return (
    <div className="flex max-w-xl flex-col gap-4 py-10">
      <p className="font-mono text-reading text-glow">404</p>
      <h1 className="text-title font-bold">Not part of this workshop</h1>
      <p className="text-muted">That page does not exist here, or is only available in development and the demo.</p>
      <Link href="/workshop" className="font-bold text-signal underline underline-offset-4">
        Back to the workshop
      </Link>
    </div>
  );
}
