import katex from "katex";
import "katex/dist/katex.min.css";
import type { Metadata } from "next";
import { Link } from "@/components/ui/link";
import { notFound, redirect } from "next/navigation";
import { DrillPanel } from "@/components/drills/drill-panel";
import { getDrill } from "@/db/queries/drills";
import { getCalculator } from "@/lib/calc/registry";
import { ForbiddenError, NotFoundError } from "@/lib/errors";
import { parseId } from "@/lib/ids";
import { getMember } from "@/server/auth/member";

export const metadata: Metadata = { title: "Drill" };

/** Another workshop's drill, or another apprentice's, is our 404: the page never says whether it exists. */
function load(member: Parameters<typeof getDrill>[0], id: number) {
  try {
    return getDrill(member, id);
  } catch (err) {
    if (err instanceof NotFoundError || err instanceof ForbiddenError) notFound();
    throw err;
  }
}

export default async function DrillPage({ params }: { params: Promise<{ id: string }> }) {
  const idText = (await params).id;
  const member = await getMember();
  if (!member) redirect(`/sign-in?next=${encodeURIComponent(`/drills/${idText}`)}`);
  const id = parseId(idText) ?? notFound();
  const { result, mine, ...drill } = load(member, id);
  // An answered drill's working is typeset here, so it reads before KaTeX loads in the browser.
  const serverHtml = result
    ? Object.fromEntries(result.steps.map((s) => [s.latex, katex.renderToString(s.latex, { throwOnError: false, displayMode: true, output: "htmlAndMathml" })]))
    : undefined;
  return (
    <div className="mx-auto max-w-3xl">
      <Link href="/drills" className="font-bold text-signal underline underline-offset-4">
        ← All drills
      </Link>
      <p className="mt-4 font-bold uppercase tracking-widest text-glow">{getCalculator(drill.slug)?.title ?? drill.slug}</p>
      <h1 className="mb-6 mt-1 text-title font-bold">{drill.title}</h1>
      <DrillPanel key={drill.id} drill={drill} initial={result} mine={mine} serverHtml={serverHtml} />
    </div>
  );
}
