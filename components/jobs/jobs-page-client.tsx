"use client";

import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Card } from "@/components/ui/card";
import { JobForm } from "./job-form";
import { JobList, type JobPage } from "./job-list";

export function JobsPageClient({ workshopName, canCreate, firstPage }: { workshopName: string; canCreate: boolean; firstPage: JobPage }) {
  const [creating, setCreating] = useState(false);
  return (
    <>
      <div className="mb-6 flex flex-wrap items-end justify-between gap-4">
        <div>
          <h1 className="text-title font-bold">Jobs</h1>
          <p className="mt-1 text-muted">Every set on the bench at {workshopName}, and the ones that have gone home.</p>
        </div>
        {canCreate && !creating ? <Button onClick={() => setCreating(true)}>Book in a set</Button> : null}
      </div>
      {creating ? (
        <Card className="mb-6">
          <h2 className="mb-4 text-lead font-bold">Book in a set</h2>
          <JobForm onDone={() => setCreating(false)} />
        </Card>
      ) : null}
      <JobList firstPage={firstPage} />
    </>
  );
}
