"use client";

import { useEffect, useRef, useState } from "react";

/**
 * True once the element is within `margin` of the viewport, and from then on. For panels low on a
 * page that load code or data of their own: a phone does not fetch them with the page, and by the
 * time someone scrolls down they are there.
 */
export function useNearView<T extends Element>(margin = "300px") {
  const ref = useRef<T>(null);
  const [near, setNear] = useState(false);
  useEffect(() => {
    const el = ref.current;
    if (!el || near) return;
    const seen = new IntersectionObserver((entries) => entries.some((e) => e.isIntersecting) && setNear(true), { rootMargin: margin });
    seen.observe(el);
    return () => seen.disconnect();
  }, [near, margin]);
  return [ref, near] as const;
}
