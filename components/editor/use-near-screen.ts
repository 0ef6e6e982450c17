"use client";

import { useEffect, useState, type RefObject } from "react";

/** True while the element is within a screen's height of the viewport; true before it is measured. */
export function useNearScreen(ref: RefObject<HTMLElement | null>): boolean {
  const [near, setNear] = useState(true);
  useEffect(() => {
    const el = ref.current;
    if (!el || typeof IntersectionObserver === "undefined") return;
    const io = new IntersectionObserver((entries) => setNear(entries.some((e) => e.isIntersecting)), { rootMargin: "100% 0px" });
    io.observe(el);
    return () => io.disconnect();
  }, [ref]);
  return near;
}
