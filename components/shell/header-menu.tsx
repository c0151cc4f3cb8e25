"use client";

import { usePathname } from "next/navigation";
import { useState, type ReactNode } from "react";

/**
 * The header's links and account on a phone: one row with a Menu button instead of three rows of
 * links above every page. From 640 px the links show as they are, and the button is gone. The menu
 * closes itself on the next page, since it is only open for the address it was opened on.
 */
export function HeaderMenu({ children }: { children: ReactNode }) {
  const pathname = usePathname();
  const [openOn, setOpenOn] = useState<string | null>(null);
  const open = openOn === pathname;
  return (
    <>
      <button
        type="button"
        aria-expanded={open}
        aria-controls="site-menu"
        onClick={() => setOpenOn(open ? null : pathname)}
        className="ml-auto inline-flex min-h-11 items-center gap-2 rounded-chip border border-rule px-4 font-bold text-ink hover:bg-sunk sm:hidden"
      >
        <span aria-hidden="true" className="font-mono">
          {open ? "×" : "≡"}
        </span>
        Menu
      </button>
      <div
        id="site-menu"
        className={`${open ? "flex" : "hidden"} w-full flex-col gap-3 border-t border-rule pt-3 sm:flex sm:w-auto sm:flex-1 sm:flex-row sm:flex-wrap sm:items-center sm:gap-x-6 sm:gap-y-2 sm:border-0 sm:pt-0`}
      >
        {children}
      </div>
    </>
  );
}
