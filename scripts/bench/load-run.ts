/**
 * One autocannon phase on loopback and its line in the report: requests per
 * second, p50/p99 latency, connection errors and non-2xx answers.
 */
import autocannon, { type Options, type Result } from "autocannon";

export type Phase = { label: string; result: Result };

export async function drive(label: string, options: Options): Promise<Phase> {
  process.stdout.write(`bench: ${label}… `);
  const result = await autocannon({ connections: 10, duration: 10, timeout: 10, ...options, title: label });
  console.log(`${Math.round(result.requests.average)} req/s`);
  return { label, result };
}

/** Connection errors and timeouts plus every answer outside 2xx. */
export const failures = (r: Result) => r.errors + r.timeouts + r.non2xx;

export function table(phases: Phase[], ceiling: Phase): string {
  const head = ["", "req/s", "p50 ms", "p99 ms", "requests", "errors", "non-2xx", "vs ceiling"];
  const rows = phases.map(({ label, result: r }) => [
    label,
    r.requests.average.toFixed(0),
    r.latency.p50.toFixed(1),
    r.latency.p99.toFixed(1),
    String(r.requests.total),
    String(r.errors + r.timeouts),
    r.non2xx ? `${r.non2xx} (${Object.entries(r.statusCodeStats).filter(([s]) => !s.startsWith("2")).map(([s, c]) => `${s}×${c.count}`).join(" ")})` : "0",
    `${((100 * r.requests.average) / ceiling.result.requests.average).toFixed(0)} %`,
  ]);
  const widths = head.map((h, i) => Math.max(h.length, ...rows.map((row) => row[i]!.length)));
  const line = (cells: string[]) => cells.map((c, i) => (i === 0 ? c.padEnd(widths[i]!) : c.padStart(widths[i]!))).join("  ");
  return [line(head), ...rows.map(line)].join("\n");
}
