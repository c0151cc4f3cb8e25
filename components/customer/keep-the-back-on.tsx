import { KEEP_THE_BACK_ON } from "@/lib/customer/reminders";

/** The customer pages' one word about the set's insides: plain, calm, and about their set, not the bench's procedures. */
export function KeepTheBackOn({ when }: { when: "waiting" | "home" }) {
  return (
    <aside className="rounded-card border border-rule border-l-4 border-l-caution bg-panel p-4 text-ink" aria-label="About your set">
      <p className="font-bold">{KEEP_THE_BACK_ON.title}</p>
      <p className="mt-1">{KEEP_THE_BACK_ON[when]}</p>
    </aside>
  );
}
