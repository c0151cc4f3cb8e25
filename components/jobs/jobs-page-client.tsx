"use client";

import { Link } from "@/components/ui/link";
import { useState } from "react";
import type { PickedCustomer } from "@/components/customers/customer-picker";
import { Button } from "@/components/ui/button";
import { Card } from "@/components/ui/card";
import { LazyJobForm as JobForm } from "./lazy-forms";
import { JobList, type JobPage } from "./job-list";

const quietLink = "inline-flex min-h-11 items-center rounded-chip border border-rule bg-panel px-4 font-bold hover:bg-sunk";

/** `bookFor`: a customer whose page asked to book a set in for them; the form opens with them chosen. */
export function JobsPageClient({
  workshopName,
  canCreate,
  firstPage,
  bookFor = null,
}: {
  workshopName: string;
  canCreate: boolean;
  firstPage: JobPage;
  bookFor?: PickedCustomer;
}) {
  const [creating, setCreating] = useState(bookFor !== null && canCreate);
  return (
    <>
      <div className="mb-6 flex flex-wrap items-end justify-between gap-4">
        <div>
          <h1 className="text-title font-bold">Jobs</h1>
          <p className="mt-1 text-muted">Every set on the bench at {workshopName}, and the ones that have gone home.</p>
        </div>
        <div className="flex flex-wrap gap-3">
          <Link href="/jobs/orders" className={quietLink}>
            Order list
          </Link>
          <Link href="/customers" className={quietLink}>
            Customers
          </Link>
          {canCreate && !creating ? <Button onClick={() => setCreating(true)}>Book in a set</Button> : null}
        </div>
      </div>
      {creating ? (
        <Card className="mb-6">
          <h2 className="mb-4 text-lead font-bold">Book in a set</h2>
          <JobForm onDone={() => setCreating(false)} bookFor={bookFor} />
        </Card>
      ) : null}
      <JobList firstPage={firstPage} />
    </>
  );
}
