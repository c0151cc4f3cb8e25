"use client";

import NextLink from "next/link";
import { useState, type ComponentProps } from "react";

/**
 * The framework's link, prefetching its page once the user shows intent (a pointer over it, focus,
 * a touch) rather than as soon as it scrolls into view. A job's Overview shows some thirty links;
 * fetching them all on arrival cost a phone on a slow line about a second before the page settled
 * (README, "Pages on a phone and a desk"). The framework's guide gives this pattern under
 * "Hover-triggered prefetch". `prefetch={false}` still turns prefetching off altogether.
 */
export function Link({ prefetch, onMouseEnter, onFocus, onTouchStart, ...props }: ComponentProps<typeof NextLink>) {
  const [intent, setIntent] = useState(false);
  const show = () => setIntent(true);
  return (
    <NextLink
      {...props}
      prefetch={prefetch === false || !intent ? false : (prefetch ?? null)}
      onMouseEnter={(e) => {
        show();
        onMouseEnter?.(e);
      }}
      onFocus={(e) => {
        show();
        onFocus?.(e);
      }}
      onTouchStart={(e) => {
        show();
        onTouchStart?.(e);
      }}
    />
  );
}
