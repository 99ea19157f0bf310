/**
 * Page benchmark (issue 12): Lighthouse 12.2.3 (desktop preset) in Debian's
 * Chromium against the production build on loopback, for the sign-in page, the
 * recipe list and the bench of a demo recipe (signed in as the demo formulator;
 * the session cookie goes with every request). Prints the performance score,
 * LCP, CLS and TBT of each page (median of BARWRIGHT_BENCH_RUNS runs, default 3)
 * against the targets (score ≥ 95, LCP < 1.0 s, CLS < 0.05, TBT < 100 ms), and
 * the JavaScript each page loads.
 *
 * Run: npm run bench:pages (BARWRIGHT_TEST_SLOT=N moves ports and folders;
 * BARWRIGHT_BENCH_SKIP_BUILD=1 reuses the last build).
 */
import { cpus, loadavg, totalmem } from "node:os";
import { Client } from "pg";
import { execFileSync } from "node:child_process";
import { gzipSync } from "node:zlib";
import { buildApp, freshDatabase, startServer, stackFor, withCleanup } from "./bench/stack";

const stack = stackFor("pages");
const runs = Math.max(1, Number(process.env.BARWRIGHT_BENCH_RUNS ?? 3));
const DEMO_FORMULATOR = "theo@fenwicklane.example";

/** A session for the demo formulator, made the way sign-in makes one (lib/auth), and the House dark's id. */
async function signedIn(): Promise<{ cookie: string; recipeId: string }> {
  const client = new Client({ connectionString: stack.databaseUrl });
  await client.connect();
  const { rows } = await client.query<{ user_id: string; workspace_id: string; recipe_id: string }>(
    `select u.id as user_id, m.workspace_id, r.id as recipe_id from users u join memberships m on m.user_id = u.id
     join recipes r on r.workspace_id = m.workspace_id where u.email = $1 and r.name ilike 'House dark%' limit 1`,
    [DEMO_FORMULATOR],
  );
  await client.end();
  const row = rows[0];
  if (!row) throw new Error("bench: the demo formulator or the House dark recipe is missing from the seed");
  process.env.DATABASE_URL = stack.databaseUrl;
  const { lucia } = await import("../lib/auth/lucia");
  const { generateToken, hashToken } = await import("../lib/auth/tokens");
  const { pool } = await import("../db/client");
  const token = generateToken();
  await lucia.createSession(row.user_id, { activeWorkspaceId: row.workspace_id, createdAt: new Date() }, { sessionId: hashToken(token) });
  await pool.end();
  return { cookie: `${lucia.sessionCookieName}=${token}`, recipeId: row.recipe_id };
}

type PageFigures = {
  score: number;
  lcpMs: number;
  cls: number;
  tbtMs: number;
  fcpMs: number;
  /** Scripts the page loaded: count, bytes on the wire and uncompressed. */
  scripts: { count: number; transferBytes: number; resourceBytes: number; urls: string[] };
};

/** One Lighthouse run in its own plain-node process (scripts/bench/lighthouse-page.mjs). */
function measurePage(url: string, cookie?: string): PageFigures {
  const out = execFileSync("node", ["scripts/bench/lighthouse-page.mjs", url, ...(cookie ? [cookie] : [])], { encoding: "utf8", stdio: ["ignore", "pipe", "inherit"] });
  return JSON.parse(out.trim().split("\n").at(-1)!) as PageFigures;
}

/** fetch, once more on a network error (a kept-alive socket the server closed during a long Lighthouse run). */
async function fetchAgain(url: string | URL, init: RequestInit = {}): Promise<Response> {
  try {
    return await fetch(url, init);
  } catch {
    return fetch(url, init);
  }
}

/**
 * First-load JavaScript: the scripts the page's HTML names (what must arrive before it is
 * interactive), uncompressed and gzipped; chunks imported later (a chart) are not counted.
 */
async function firstLoadJs(path: string, cookie?: string): Promise<{ count: number; bytes: number; gzipBytes: number }> {
  const html = await (await fetchAgain(`${stack.base}${path}`, { headers: cookie ? { cookie } : {} })).text();
  // Module-capable browsers skip `nomodule` scripts (Next's legacy polyfills): not counted.
  const tags = [...html.matchAll(/<script\b([^>]*)>/g)].map((m) => m[1]!).filter((attrs) => !/\bnomodule\b/i.test(attrs));
  const sources = [...new Set(tags.flatMap((attrs) => [...attrs.matchAll(/\ssrc="([^"]+)"/g)].map((m) => m[1]!.replace(/&amp;/g, "&"))))];
  let bytes = 0;
  let gzipBytes = 0;
  for (const src of sources) {
    const body = Buffer.from(await (await fetchAgain(new URL(src, stack.base))).arrayBuffer());
    bytes += body.length;
    gzipBytes += gzipSync(body).length;
  }
  return { count: sources.length, bytes, gzipBytes };
}

const median = (values: number[]) => [...values].sort((a, b) => a - b)[Math.floor(values.length / 2)]!;
const kb = (bytes: number) => `${(bytes / 1024).toFixed(0)} kB`;

async function main(track: Parameters<Parameters<typeof withCleanup>[1]>[0]): Promise<boolean> {
  freshDatabase(stack);
  buildApp(stack);
  track(await startServer(stack));
  const { cookie, recipeId } = await signedIn();
  const pages: { label: string; path: string; cookie?: string }[] = [
    { label: "sign-in", path: "/sign-in" },
    { label: "recipe list", path: "/recipes", cookie },
    { label: "bench (House dark)", path: `/recipes/${recipeId}`, cookie },
  ];
  const results: { label: string; path: string; runs: PageFigures[]; firstLoad: Awaited<ReturnType<typeof firstLoadJs>> }[] = [];
  // One unmeasured visit each: the server loads each route's code on first use.
  for (const p of pages) await fetch(`${stack.base}${p.path}`, { headers: p.cookie ? { cookie: p.cookie } : {} }).then((r) => r.text());
  const load = loadavg()[0]!;
  for (const p of pages) {
    const figures: PageFigures[] = [];
    for (let i = 0; i < runs; i++) figures.push(measurePage(`${stack.base}${p.path}`, p.cookie));
    console.log(`bench: ${p.label}: scores ${figures.map((f) => f.score).join(", ")}`);
    results.push({ label: p.label, path: p.path, runs: figures, firstLoad: await firstLoadJs(p.path, p.cookie) });
  }

  console.log(`\nbench:pages — Lighthouse 12.2.3, desktop preset, median of ${runs}; ${new Date().toISOString().slice(0, 10)}, ${cpus().length} cores, ${(totalmem() / 2 ** 30).toFixed(0)} GiB, load average ${load.toFixed(2)} before measuring`);
  const head = ["page", "score", "LCP", "CLS", "TBT", "FCP", "first-load JS (gzip / raw)", "all JS while loading"];
  const rows = results.map(({ label, runs: r, firstLoad }) => {
    const js = r[0]!.scripts;
    return [
      label,
      String(median(r.map((f) => f.score))),
      `${(median(r.map((f) => f.lcpMs)) / 1000).toFixed(2)} s`,
      median(r.map((f) => f.cls)).toFixed(3),
      `${median(r.map((f) => f.tbtMs)).toFixed(0)} ms`,
      `${(median(r.map((f) => f.fcpMs)) / 1000).toFixed(2)} s`,
      `${firstLoad.count} files, ${kb(firstLoad.gzipBytes)} / ${kb(firstLoad.bytes)}`,
      `${js.count} files, ${kb(js.resourceBytes)}`,
    ];
  });
  const widths = head.map((h, i) => Math.max(h.length, ...rows.map((row) => row[i]!.length)));
  for (const row of [head, ...rows]) console.log(row.map((c, i) => (i === 0 ? c.padEnd(widths[i]!) : c.padStart(widths[i]!))).join("  "));
  if (process.env.BARWRIGHT_BENCH_VERBOSE === "1") {
    for (const { label, runs: r } of results) console.log(`${label}: scripts while loading\n  ${r[0]!.scripts.urls.join("\n  ")}`);
  }

  let ok = true;
  for (const { label, runs: r } of results) {
    const checks: [string, boolean][] = [
      ["score ≥ 95", median(r.map((f) => f.score)) >= 95],
      ["LCP < 1.0 s", median(r.map((f) => f.lcpMs)) < 1000],
      ["CLS < 0.05", median(r.map((f) => f.cls)) < 0.05],
      ["TBT < 100 ms", median(r.map((f) => f.tbtMs)) < 100],
    ];
    const failed = checks.filter(([, pass]) => !pass).map(([name]) => name);
    ok &&= failed.length === 0;
    console.log(`${failed.length === 0 ? "PASS" : "FAIL"}  ${label}${failed.length ? `: misses ${failed.join(", ")}` : ""}`);
  }
  return ok;
}

void withCleanup(stack, main);
