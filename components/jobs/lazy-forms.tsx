"use client";

import dynamic from "next/dynamic";

/**
 * The job pages' forms that start closed or appear only in one state, loaded when first shown. They
 * check their input with zod (some 30 kB gzipped) and react-hook-form; imported directly, that code
 * would join the first load of the jobs list and of every job's Overview (tests/unit/client-weight.test.ts).
 */

const opening = () => <p className="text-note text-muted">Opening the form…</p>;

/** Book in a set, or edit its details. */
export const LazyJobForm = dynamic(() => import("./job-form").then((m) => m.JobForm), { loading: opening });

/** The checks before "at the counter", shown when a change of status or the ready message is refused. */
export const LazyReadyChecksPanel = dynamic(() => import("./ready-checks").then((m) => m.ReadyChecksPanel), { loading: opening });

/** "Tell the customer it's ready", on the Overview of a set at the counter. */
export const LazyReadyMessage = dynamic(() => import("./ready-message").then((m) => m.ReadyMessage), {
  loading: () => <p className="text-note text-muted">Loading the customer message…</p>,
});
