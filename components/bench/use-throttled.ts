"use client";

import { startTransition, useEffect, useRef, useState } from "react";

/**
 * `value`, passed on at most once every `ms` (the latest one always arrives), at
 * a low priority. For drawings that cost more than a frame to redraw: they follow
 * a drag a few times a second and land on the final figures.
 */
export function useThrottled<T>(value: T, ms: number): T {
  const [shown, setShown] = useState(value);
  const last = useRef(0);
  useEffect(() => {
    const wait = Math.max(0, last.current + ms - Date.now());
    const timer = window.setTimeout(() => {
      last.current = Date.now();
      startTransition(() => setShown(value));
    }, wait);
    return () => window.clearTimeout(timer);
  }, [value, ms]);
  return shown;
}
