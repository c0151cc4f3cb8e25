import { Link } from "@/components/ui/link";

export default function BenchNotFound() {
  return (
    <div className="mx-auto flex min-h-[50vh] max-w-xl flex-col justify-center gap-4">
      <p className="font-mono text-reading text-glow">404</p>
      <h1 className="text-title font-bold">No such calculator</h1>
      <p className="text-muted">The Bench has no calculator at this address. The index lists every one, grouped by bench task.</p>
      <Link href="/bench" className="font-bold text-signal underline underline-offset-4">
        See every calculator
      </Link>
    </div>
  );
}
