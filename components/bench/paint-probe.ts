/**
 * Input-to-paint marks for `npm run bench:slider`. Off unless the page was
 * opened with localStorage "barwright:bench-probe" = "1", so a normal session
 * never fills the performance timeline.
 */
let enabled: boolean | null = null;

function on(): boolean {
  if (enabled === null) {
    try {
      enabled = typeof window !== "undefined" && window.localStorage.getItem("barwright:bench-probe") === "1";
    } catch {
      enabled = false;
    }
  }
  return enabled;
}

/** At the slider's input handler. */
export function markInput(): void {
  if (on()) performance.mark("bench:input");
}

/**
 * After React committed the composition panel: the frame's paint follows the
 * next animation frame, and a message posted from it runs once that paint is done.
 */
export function markPaintAfterCommit(): void {
  if (!on()) return;
  performance.mark("bench:commit");
  requestAnimationFrame(() => {
    const channel = new MessageChannel();
    channel.port1.onmessage = () => performance.mark("bench:paint");
    channel.port2.postMessage(null);
  });
}
