"use client";

import { startTransition, useEffect, useState } from "react";

/**
 * `value` for drawings that cost more than a frame to redraw (the Recharts chart):
 * passed on, at a low priority, once it has not changed for `wait` ms. While a
 * thumb moves the drawing waits; it shows the final mix as soon as the thumb rests.
 */
export function useCalmValue<T>(value: T, wait: number): T {
  const [shown, setShown] = useState(value);
  useEffect(() => {
    const timer = window.setTimeout(() => startTransition(() => setShown(value)), wait);
    return () => window.clearTimeout(timer);
  }, [value, wait]);
  return shown;
}
