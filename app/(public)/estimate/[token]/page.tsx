import type { Metadata } from "next";
import { AnswerButtons } from "@/components/estimates/answer-buttons";
import { BillLines } from "@/components/customer/bill-lines";
import { RepairDisclaimer } from "@/components/estimates/repair-disclaimer";
import { Notice } from "@/components/customer/notice";
import { Card } from "@/components/ui/card";
import { EQUIPMENT_KIND_LABELS } from "@/lib/vocabulary";
import { findEstimateByToken } from "@/db/queries/estimates";

// The token is the credential: never indexed, never sent on as a referrer.
export const metadata: Metadata = { title: "Your estimate", robots: { index: false, follow: false }, referrer: "no-referrer" };
export const dynamic = "force-dynamic";

export default async function EstimateAnswerPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const found = token.length >= 20 && token.length <= 200 ? findEstimateByToken(token) : { state: "unknown" as const };

  if (found.state === "unknown") {
    return (
      <Notice title="This link is not valid">Check that the whole link from the e-mail was opened, or ask the workshop to send the estimate again.</Notice>
    );
  }
  if (found.state === "expired") {
    return (
      <Notice title="This link has expired">
        Ask {found.workshopName} for a new estimate{found.contactEmail ? ` at ${found.contactEmail}` : ""}.
      </Notice>
    );
  }
  if (found.state === "answered") {
    return (
      <Notice title="This estimate has been answered">
        {found.workshopName} has your answer ({found.status}). The link works only once; ask the workshop if you want to change it.
      </Notice>
    );
  }
  const { workshop, job, estimate } = found;
  return (
    <div className="flex flex-col gap-6">
      <div>
        <p className="text-note font-bold uppercase tracking-wide text-muted">Estimate from {workshop.name}</p>
        <h1 className="text-title font-bold">{job.title}</h1>
        <p className="text-muted">
          {EQUIPMENT_KIND_LABELS[job.equipmentKind]}
          {job.year ? `, ${job.year}` : ""}
          {job.customerName ? ` · for ${job.customerName}` : ""}
        </p>
      </div>
      <Card>
        <BillLines {...estimate} />
      </Card>
      <RepairDisclaimer />
      <AnswerButtons token={token} />
      <p className="text-note text-muted">
        Questions? Contact {workshop.name}
        {workshop.contactEmail ? ` at ${workshop.contactEmail}` : ""}
        {workshop.contactPhone ? ` or ${workshop.contactPhone}` : ""}.
      </p>
    </div>
  );
}
