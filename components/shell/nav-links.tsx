"use client";

import { Link } from "@/components/ui/link";
import { usePathname } from "next/navigation";

const LINKS = [
  { href: "/bench", label: "Bench", members: false },
  { href: "/jobs", label: "Jobs", members: true },
  { href: "/customers", label: "Customers", members: true },
  { href: "/drills", label: "Drills", members: true },
  { href: "/workshop", label: "Workshop", members: true },
];

export function NavLinks({ signedIn }: { signedIn: boolean }) {
  const pathname = usePathname();
  return (
    <nav aria-label="Main" className="flex flex-wrap items-center gap-1">
      {LINKS.filter((l) => signedIn || !l.members).map((l) => {
        const active = pathname === l.href || pathname.startsWith(`${l.href}/`);
        return (
          <Link
            key={l.href}
            href={l.href}
            aria-current={active ? "page" : undefined}
            className={`rounded-chip px-3 py-2 font-bold min-h-11 inline-flex items-center ${active ? "bg-ink text-paper" : "text-ink hover:bg-sunk"}`}
          >
            {l.label}
          </Link>
        );
      })}
    </nav>
  );
}
