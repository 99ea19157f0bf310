"use client";

import { startTransition, useEffect, useRef, useState } from "react";

/**
 * `value` for drawings that cost more than a frame to redraw (the Recharts chart):
 * passed on `wait` ms after it stops changing, and at least every `maxWait` ms
 * while it keeps changing, at a low priority. During a drag the drawing moves a
 * couple of times a second and lands on the final figures as soon as the thumb rests.
 */
export function useCalmValue<T>(value: T, wait: number, maxWait: number): T {
  const [shown, setShown] = useState(value);
  // When the first change not yet shown happened.
  const pendingSince = useRef<number | null>(null);
  useEffect(() => {
    const now = Date.now();
    pendingSince.current ??= now;
    const delay = Math.min(wait, Math.max(0, pendingSince.current + maxWait - now));
    const timer = window.setTimeout(() => {
      pendingSince.current = null;
      startTransition(() => setShown(value));
    }, delay);
    return () => window.clearTimeout(timer);
  }, [value, wait, maxWait]);
  return shown;
}
