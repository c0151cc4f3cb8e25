import { Link } from "@/components/ui/link";

export default function DrillsNotFound() {
  return (
    <div className="mx-auto flex min-h-[50vh] max-w-xl flex-col justify-center gap-4">
      <p className="font-mono text-reading text-glow">404</p>
      <h1 className="text-title font-bold">No such drill here</h1>
      <p className="text-muted">There is no drill at this address in your workshop, or it was set for someone else.</p>
      <Link href="/drills" className="font-bold text-signal underline underline-offset-4">
        Back to the drills
      </Link>
    </div>
  );
}
