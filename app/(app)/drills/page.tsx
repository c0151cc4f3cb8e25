import type { Metadata } from "next";
import { Link } from "@/components/ui/link";
import { notFound, redirect } from "next/navigation";
import { ApprenticeList } from "@/components/drills/apprentice-list";
import { AssignForm } from "@/components/drills/assign-form";
import { AssignmentList } from "@/components/drills/assignment-list";
import { KindList } from "@/components/drills/kind-list";
import { ProgressPanel } from "@/components/drills/progress-panel";
import { Card } from "@/components/ui/card";
import type { DrillProgress } from "@/db/queries/drill-progress";
import { apprenticesProgress, drillProgress, listAssignments } from "@/db/queries/drills";
import { can, type Member } from "@/lib/auth/can";
import { GROUPS } from "@/lib/bench/groups";
import { describeCalculators } from "@/lib/calc/registry";
import { drillKindsFor } from "@/lib/drills";
import { NotFoundError } from "@/lib/errors";
import { parseId } from "@/lib/ids";
import { getMember } from "@/server/auth/member";

export const metadata: Metadata = {
  title: "Drills",
  description: "Bench problems made by the calculators, checked on the server, with the working and progress over time.",
};

type Props = { searchParams: Promise<{ member?: string }> };

/** One apprentice's progress and sets, for their mentor; an address naming anyone else is our 404. */
function followed(member: Member, id: number) {
  try {
    return { progress: drillProgress(member, id), sets: listAssignments(member, { apprentice: id }) };
  } catch (err) {
    if (err instanceof NotFoundError) notFound();
    throw err;
  }
}

export default async function DrillsPage({ searchParams }: Props) {
  const member = await getMember();
  if (!member) redirect("/sign-in?next=/drills");
  const mentor = can.followDrills(member);
  const memberParam = (await searchParams).member;
  const viewId = mentor && memberParam !== undefined ? (parseId(memberParam) ?? notFound()) : null;
  const own = drillProgress(member);

  return (
    <>
      <p className="font-bold uppercase tracking-widest text-glow">Drills</p>
      <h1 className="mt-2 text-display font-bold">Bench problems, checked by the calculators</h1>
      <p className="mb-8 mt-3 max-w-3xl text-lead text-muted">
        Each drill is a problem made by one of the Bench&apos;s calculators. Answer the way you would write it at the bench (1k5, 250 mW); the answer is checked
        on the server, and the working comes back step by step with the place this kind usually goes wrong.
      </p>
      {mentor ? <MentorView member={member} viewId={viewId} /> : <ApprenticeView member={member} progress={own} />}
      <section className="mt-10" aria-labelledby="kinds-title">
        <h2 id="kinds-title" className="text-title font-bold">
          {mentor ? "Practise yourself" : "Start a drill"}
        </h2>
        <p className="mb-4 mt-1 text-muted">Grouped like the Bench. Your level in each kind rises with right answers spread over days and falls with misses.</p>
        <KindList progress={own.kinds} openFirst={!mentor} />
      </section>
    </>
  );
}

function ApprenticeView({ member, progress }: { member: Member; progress: DrillProgress }) {
  const sets = listAssignments(member).filter((a) => a.state !== "done");
  return (
    <div className="grid gap-6 lg:grid-cols-[2fr_3fr] lg:items-start">
      <Card>
        <h2 className="mb-3 text-lead font-bold">Set for you</h2>
        <AssignmentList assignments={sets} showApprentice={false} />
      </Card>
      <Card className="min-w-0">
        <h2 className="mb-3 text-lead font-bold">Your progress</h2>
        <ProgressPanel progress={progress} own />
      </Card>
    </div>
  );
}

function MentorView({ member, viewId }: { member: Member; viewId: number | null }) {
  const apprentices = apprenticesProgress(member);
  const view = viewId === null ? null : followed(member, viewId);
  // The assign form lists calculators with drills in the Bench's order of groups.
  const order = GROUPS.map((g) => g.id as string);
  const calculators = describeCalculators()
    .filter((c) => drillKindsFor(c.slug).length > 0)
    .sort((a, b) => order.indexOf(a.group) - order.indexOf(b.group))
    .map((c) => ({ slug: c.slug, title: c.title, group: GROUPS.find((g) => g.id === c.group)?.title ?? c.group }));
  return (
    <div className="flex flex-col gap-6">
      {view ? (
        <Card className="min-w-0">
          <div className="mb-3 flex flex-wrap items-baseline justify-between gap-2">
            <h2 className="text-lead font-bold">Progress of {view.progress.member.name}</h2>
            <Link href="/drills" className="font-bold text-signal underline underline-offset-4">
              Close
            </Link>
          </div>
          <ProgressPanel progress={view.progress} own={false} />
          <h3 className="mb-2 mt-6 font-bold">Sets of drills</h3>
          <AssignmentList assignments={view.sets} showApprentice={false} />
        </Card>
      ) : null}
      <div className="grid gap-6 lg:grid-cols-2 lg:items-start">
        <Card>
          <h2 className="mb-1 text-lead font-bold">Apprentices</h2>
          <p className="mb-2 text-note text-muted">Open a name to see their progress by kind and over time.</p>
          <ApprenticeList apprentices={apprentices} current={viewId} />
        </Card>
        <Card>
          <h2 className="mb-3 text-lead font-bold">Set drills</h2>
          {apprentices.length ? (
            <AssignForm apprentices={apprentices.map((a) => ({ userId: a.userId, name: a.name }))} calculators={calculators} />
          ) : (
            <p className="text-muted">Drills are set for apprentices; there are none in this workshop yet.</p>
          )}
        </Card>
      </div>
      <Card>
        <h2 className="mb-3 text-lead font-bold">Sets given</h2>
        <AssignmentList assignments={listAssignments(member)} showApprentice />
      </Card>
    </div>
  );
}
