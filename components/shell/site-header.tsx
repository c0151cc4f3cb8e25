import { Link } from "@/components/ui/link";
import { getMember } from "@/server/auth/member";
import { RoleBadge } from "@/components/ui/card";
import { HeaderMenu } from "./header-menu";
import { NavLinks } from "./nav-links";
import { SignOutButton } from "./sign-out-button";
import { Wordmark } from "./logo";

export async function SiteHeader() {
  const member = await getMember();
  // A member's links and account fold into a menu on a phone; a visitor's three links stay in sight.
  const links = (
    <>
      <NavLinks signedIn={!!member} />
      <div className={member ? "flex flex-wrap items-center gap-3 sm:ml-auto" : "ml-auto flex items-center gap-3"}>
        {member ? (
          <>
            <span className="block leading-tight sm:text-right">
              <span className="block font-bold" data-testid="member-name">
                {member.name}
              </span>
              <span className="block text-note text-muted">{member.workshopName}</span>
            </span>
            <RoleBadge role={member.role} />
            <Link href="/account/password" className="rounded-chip px-3 py-2 text-note font-bold text-ink hover:bg-sunk">
              Password
            </Link>
            <SignOutButton />
          </>
        ) : (
          <>
            <Link href="/sign-in" className="rounded-chip px-3 py-2 font-bold hover:bg-sunk">
              Sign in
            </Link>
            <Link href="/sign-up" className="rounded-chip bg-glow px-3 py-2 font-bold text-glow-ink hover:brightness-110">
              Open a workshop
            </Link>
          </>
        )}
      </div>
    </>
  );
  return (
    <header className="gb-no-print border-b border-rule bg-panel">
      <div className="mx-auto flex max-w-6xl flex-wrap items-center gap-x-6 gap-y-2 px-4 py-3">
        <Link href={member ? "/jobs" : "/"} aria-label="Glowbench home">
          <Wordmark />
        </Link>
        {member ? <HeaderMenu>{links}</HeaderMenu> : links}
      </div>
    </header>
  );
}
