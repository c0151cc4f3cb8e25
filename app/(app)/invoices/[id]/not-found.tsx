import { Link } from "@/components/ui/link";

export default function InvoiceNotFound() {
  return (
    <div className="flex flex-col gap-3">
      <h1 className="text-title font-bold">No such invoice in your workshop</h1>
      <p className="text-muted">
        Invoices live with their jobs. Open the job from{" "}
        <Link href="/jobs" className="underline">
          Jobs
        </Link>{" "}
        and look under its estimate.
      </p>
    </div>
  );
}
