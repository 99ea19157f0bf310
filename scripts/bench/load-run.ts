/**
 * One autocannon phase on loopback and its line in the report: requests per
 * second, p50/p99 latency, connection errors and non-2xx answers, and — when
 * the server's PID is given — the server's CPU time per request (from
 * /proc/PID/stat: user + system), a figure the load generator sharing the
 * machine does not distort the way it distorts throughput.
 */
import { readFileSync } from "node:fs";
import autocannon, { type Options, type Result } from "autocannon";

export type Phase = { label: string; result: Result; cpuMsPerRequest: number | null };

/** CPU seconds (user + system) a process has used, or null where /proc cannot say. */
export function cpuSeconds(pid: number | undefined): number | null {
  if (!pid) return null;
  try {
    // Fields after the command name (which may hold spaces): utime and stime are the 12th and 13th.
    const stat = readFileSync(`/proc/${pid}/stat`, "utf8");
    const fields = stat.slice(stat.lastIndexOf(")") + 2).split(" ");
    return (Number(fields[11]) + Number(fields[12])) / 100; // USER_HZ is 100 on Linux
  } catch {
    return null;
  }
}

export async function drive(label: string, options: Options, serverPid?: number): Promise<Phase> {
  process.stdout.write(`bench: ${label}… `);
  const cpuBefore = cpuSeconds(serverPid);
  const result = await autocannon({ connections: 10, duration: 10, timeout: 10, ...options, title: label });
  const cpuAfter = cpuSeconds(serverPid);
  const cpuMsPerRequest = cpuBefore !== null && cpuAfter !== null && result.requests.total > 0 ? ((cpuAfter - cpuBefore) * 1000) / result.requests.total : null;
  console.log(`${Math.round(result.requests.average)} req/s${cpuMsPerRequest === null ? "" : `, ${cpuMsPerRequest.toFixed(2)} ms server CPU a request`}`);
  return { label, result, cpuMsPerRequest };
}

/** Connection errors and timeouts plus every answer outside 2xx. */
export const failures = (r: Result) => r.errors + r.timeouts + r.non2xx;

/** Requests a second over several phases together (their requests over their seconds). */
export function rate(phases: Phase[]): number {
  const requests = phases.reduce((n, p) => n + p.result.requests.total, 0);
  const seconds = phases.reduce((n, p) => n + p.result.duration, 0);
  return seconds > 0 ? requests / seconds : 0;
}

export function table(phases: Phase[], ceilingRate: number): string {
  const head = ["", "req/s", "p50 ms", "p99 ms", "requests", "errors", "non-2xx", "CPU ms/req", "vs ceiling"];
  const rows = phases.map(({ label, result: r, cpuMsPerRequest }) => [
    label,
    r.requests.average.toFixed(0),
    r.latency.p50.toFixed(1),
    r.latency.p99.toFixed(1),
    String(r.requests.total),
    String(r.errors + r.timeouts),
    r.non2xx ? `${r.non2xx} (${Object.entries(r.statusCodeStats).filter(([s]) => !s.startsWith("2")).map(([s, c]) => `${s}×${c.count}`).join(" ")})` : "0",
    cpuMsPerRequest === null ? "–" : cpuMsPerRequest.toFixed(2),
    `${((100 * r.requests.average) / ceilingRate).toFixed(0)} %`,
  ]);
  const widths = head.map((h, i) => Math.max(h.length, ...rows.map((row) => row[i]!.length)));
  const line = (cells: string[]) => cells.map((c, i) => (i === 0 ? c.padEnd(widths[i]!) : c.padStart(widths[i]!))).join("  ");
  return [line(head), ...rows.map(line)].join("\n");
}
