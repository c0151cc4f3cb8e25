import { redirect } from "next/navigation";
import { HighVoltageNote } from "@/components/bench/danger-banner";
import { ButtonLink } from "@/components/ui/button";
import { getMember } from "@/server/auth/member";

const POINTS = [
  { title: "Working shown", text: "Every result comes with its formula, your numbers substituted, and the handbook it comes from." },
  { title: "One record per set", text: "Parts to replace, resistor survey, saved calculations, photos, schematics and the bench log." },
  { title: "Made for a team", text: "Owners, technicians and apprentices share the workshop; each sees what their role allows." },
];

export default async function HomePage() {
  if (await getMember()) redirect("/jobs");
  return (
    <div className="py-8">
      <p className="font-bold uppercase tracking-widest text-glow">For restorers of tube-era sets</p>
      <h1 className="mt-3 max-w-3xl text-display font-bold">The bench companion that shows its working.</h1>
      <p className="mt-4 max-w-2xl text-lead text-muted">
        Cathode bias, bleeder resistors, filter ripple, heater strings and arc clearance, worked out step by step, and a job record for every radio, amplifier
        and television in the shop.
      </p>
      <div className="mt-8 flex flex-wrap gap-3">
        <ButtonLink href="/bench">Open the Bench</ButtonLink>
        <ButtonLink href="/sign-in" variant="secondary">
          Sign in
        </ButtonLink>
      </div>
      <div className="mt-8 max-w-3xl">
        <HighVoltageNote />
      </div>
      <ul className="mt-14 grid gap-6 md:grid-cols-3">
        {POINTS.map((p) => (
          <li key={p.title} className="rounded-card border border-rule bg-panel p-6 shadow-card">
            <h2 className="text-lead font-bold">{p.title}</h2>
            <p className="mt-2 text-muted">{p.text}</p>
          </li>
        ))}
      </ul>
    </div>
  );
}
