"use client";

import { useEffect, useRef, useState, type ReactNode } from "react";

/**
 * Renders `children` once the slot comes near the viewport, and keeps them from then
 * on; until then, `placeholder`. Keeps heavy panels below the fold off a page's load.
 */
export function OnceVisible({ children, placeholder, margin = "400px", testId }: { children: ReactNode; placeholder: ReactNode; margin?: string; testId?: string }) {
  const ref = useRef<HTMLDivElement>(null);
  const [seen, setSeen] = useState(false);
  useEffect(() => {
    const el = ref.current;
    if (seen || !el) return;
    const observer = new IntersectionObserver((entries) => {
      if (entries.some((e) => e.isIntersecting)) setSeen(true);
    }, { rootMargin: margin });
    observer.observe(el);
    return () => observer.disconnect();
  }, [seen, margin]);
  return (
    <div ref={ref} data-testid={testId}>
      {seen ? children : placeholder}
    </div>
  );
}
