"use client";

import { startTransition, useEffect, useRef, useState } from "react";

/**
 * `value`, passed on once the frame showing it has been painted, at a low
 * priority, at most once a frame (always the latest). For panels that should
 * follow every move but must not delay the frame that shows the move itself.
 */
export function useAfterPaint<T>(value: T): T {
  const [shown, setShown] = useState(value);
  const latest = useRef(value);
  const pending = useRef(false);
  useEffect(() => {
    latest.current = value;
    if (pending.current) return;
    pending.current = true;
    requestAnimationFrame(() => {
      // A message posted from the animation frame is handled after that frame is painted.
      const channel = new MessageChannel();
      channel.port1.onmessage = () => {
        pending.current = false;
        startTransition(() => setShown(latest.current));
      };
      channel.port2.postMessage(null);
    });
  }, [value]);
  return shown;
}
