import { Link } from "@/components/ui/link";
import { Wordmark } from "@/components/shell/logo";

export default function NotFound() {
  return (
    <main className="mx-auto flex min-h-screen max-w-xl flex-col justify-center gap-4 px-6">
      <Wordmark />
      <p className="font-mono text-reading text-glow">404</p>
      <h1 className="text-title font-bold">Nothing on this bench</h1>
      <p className="text-muted">The page you asked for is not here, or it belongs to another workshop.</p>
      <p className="flex gap-4">
        <Link href="/bench" className="font-bold text-signal underline underline-offset-4">
          Go to the Bench
        </Link>
        <Link href="/jobs" className="font-bold text-signal underline underline-offset-4">
          Your jobs
        </Link>
      </p>
    </main>
  );
}
