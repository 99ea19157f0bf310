/**
 * Load benchmark (issue 12): the production server and PostgreSQL on loopback,
 * the demo plus a large generated workspace (10,000 recipes × 10 versions, 200
 * ingredients, 2,000 quotes, 500 lots), driven by autocannon for a bounded time:
 *   (a) GET /api/ping — the framework's ceiling (no database, no session)
 *   (b) POST /api/recipes/evaluate — the engine's evaluation of a 5-line recipe with costs
 *       (standards in brief, the answer's default; once more, for information, with
 *       `standards: "full"`, every check with its wording: four times the bytes)
 *   (c) GET /recipes?page=N — the recipe list page of the large workspace
 *   (d) POST /api/recipes/:id/versions — saves by 20 concurrent writers
 * then checks by SQL that no version was lost or duplicated. Targets: (b) ≥ 70 %
 * of (a); (c) p99 < 100 ms; no errors; no lost or duplicated version.
 *
 * (a) and (b) alternate over BARWRIGHT_BENCH_ROUNDS rounds (default 3), so a
 * slow spell of a shared machine falls on both; their ratio is the rounds'
 * requests together. Every phase also reports the server's CPU time per
 * request. (c) is driven twice: flat out at 10 connections (its p99 is then
 * mostly queueing) and at half the rate it reached (autocannon sends each
 * second's requests at the start of that second, so this still queues), both
 * after the sign-in page at 10 connections (c0): the cheapest page there is,
 * what Next's own rendering allows on this machine.
 *
 * Run: npm run bench:load (BARWRIGHT_TEST_SLOT=N moves ports and folders;
 * BARWRIGHT_BENCH_SKIP_BUILD=1 reuses the last build; BARWRIGHT_BENCH_SECONDS
 * sets each phase's length, default 10; BARWRIGHT_BENCH_SAVES the saves, default 1,200).
 */
import { cpus, loadavg, totalmem } from "node:os";
import { seedLargeWorkspace, LARGE, type LargeWorkspace } from "./bench/big-workspace";
import { GENERATED_TYPES, recipeName } from "./bench/generate";
import { drive, failures, rate, table, type Phase } from "./bench/load-run";
import { buildApp, freshDatabase, startServer, stackFor, withCleanup } from "./bench/stack";
import { checkVersions } from "./bench/verify";
import { linesFor, writerSetup, WRITERS, type WriterLedger } from "./bench/writers";

const stack = stackFor("load");
const seconds = Number(process.env.BARWRIGHT_BENCH_SECONDS ?? 10);
const saves = Number(process.env.BARWRIGHT_BENCH_SAVES ?? 1_200);
const rounds = Math.max(1, Number(process.env.BARWRIGHT_BENCH_ROUNDS ?? 3));

/** Session cookies made the way sign-in makes them (lib/auth: Lucia, SHA-256 of the token as id). */
async function sessionCookies(ws: LargeWorkspace, n: number): Promise<string[]> {
  process.env.DATABASE_URL = stack.databaseUrl;
  const { lucia } = await import("../lib/auth/lucia");
  const { generateToken, hashToken } = await import("../lib/auth/tokens");
  const { pool } = await import("../db/client");
  const cookies: string[] = [];
  for (let i = 0; i < n; i++) {
    const token = generateToken();
    await lucia.createSession(ws.userId, { activeWorkspaceId: ws.workspaceId, createdAt: new Date() }, { sessionId: hashToken(token) });
    cookies.push(`${lucia.sessionCookieName}=${token}`);
  }
  await pool.end();
  return cookies;
}

async function expectOk(path: string, init: RequestInit, contains?: string): Promise<void> {
  const res = await fetch(`${stack.base}${path}`, { ...init, redirect: "manual" });
  const text = await res.text();
  if (!res.ok || (contains && !text.includes(contains))) throw new Error(`bench: ${path} answered ${res.status} before the run: ${text.slice(0, 300)}`);
}

/** 20 saves at once from the same base on one recipe: exactly one may win, the rest get 409. */
async function contention(ws: LargeWorkspace, cookies: string[], ledger: WriterLedger): Promise<boolean> {
  const seq = 2_501;
  const id = ws.recipeIds[seq]!;
  const type = GENERATED_TYPES[seq % GENERATED_TYPES.length]!;
  const statuses = await Promise.all(
    cookies.map((cookie, i) =>
      fetch(`${stack.base}/api/recipes/${id}/versions`, {
        method: "POST",
        headers: { "content-type": "application/json", cookie, origin: stack.base },
        body: JSON.stringify({ baseVersionNo: LARGE.versionsEach, barMassGrams: "70", lines: linesFor(ws, type, i) }),
      }).then((r) => r.status),
    ),
  );
  const won = statuses.filter((s) => s === 201).length;
  const refused = statuses.filter((s) => s === 409).length;
  if (won) ledger.acknowledged.set(id, (ledger.acknowledged.get(id) ?? 0) + won);
  console.log(`bench: ${WRITERS} simultaneous saves from the same base: ${won} saved, ${refused} refused with 409, ${statuses.length - won - refused} other`);
  return won === 1 && refused === WRITERS - 1;
}

async function main(track: Parameters<Parameters<typeof withCleanup>[1]>[0]): Promise<boolean> {
  const started = Date.now();
  freshDatabase(stack);
  const seedStart = Date.now();
  const ws = await seedLargeWorkspace(stack.databaseUrl, console.log);
  const seedSeconds = (Date.now() - seedStart) / 1000;
  buildApp(stack);
  const server = await startServer(stack);
  track(server);
  const pid = server.pid;
  const cookies = await sessionCookies(ws, WRITERS);
  const cookie = cookies[0]!;
  const evaluateBody = JSON.stringify({ lines: linesFor(ws, "dark", 3), barMassGrams: "70" });
  const evaluateFullBody = JSON.stringify({ lines: linesFor(ws, "dark", 3), barMassGrams: "70", standards: "full" });
  const json = { "content-type": "application/json", cookie, origin: stack.base };
  await expectOk("/api/ping", {});
  await expectOk("/api/recipes/evaluate", { method: "POST", headers: json, body: evaluateBody }, '"failed"');
  await expectOk("/api/recipes/evaluate", { method: "POST", headers: json, body: evaluateFullBody }, '"clause"');
  await expectOk("/recipes", { headers: { cookie } }, recipeName(LARGE.recipes - 1, GENERATED_TYPES[(LARGE.recipes - 1) % GENERATED_TYPES.length]!));

  let page = 0;
  const pages = Math.ceil(LARGE.recipes / 25);
  // Every page in turn: the first is the one people open, the deep ones cost the most to reach.
  const listRequest = {
    setupRequest: (req: object) => {
      const n = page++ % pages;
      return { ...req, path: n === 0 ? "/recipes" : `/recipes?page=${n + 1}` };
    },
  };
  const phases = {
    ping: { url: `${stack.base}/api/ping` },
    evaluate: { url: `${stack.base}/api/recipes/evaluate`, method: "POST", headers: json, body: evaluateBody },
    evaluateFull: { url: `${stack.base}/api/recipes/evaluate`, method: "POST", headers: json, body: evaluateFullBody },
    list: { url: `${stack.base}/recipes`, headers: { cookie }, requests: [listRequest] },
    signIn: { url: `${stack.base}/sign-in` },
  };
  // Warm-up: the first requests load each route's code; the compiler takes a few seconds more
  // to settle on the hot paths of the two routes whose ratio is the target.
  for (const [name, options] of Object.entries(phases)) await drive("warm-up", { ...options, duration: name === "ping" || name === "evaluate" ? 5 : 2 });

  const load = loadavg()[0]!;
  console.log(`\nbench: measuring (${seconds} s a phase, 10 connections; load average before: ${load.toFixed(2)} on ${cpus().length} cores)`);
  const pings: Phase[] = [];
  const evaluations: Phase[] = [];
  for (let round = 1; round <= rounds; round++) {
    const of = rounds > 1 ? `, round ${round}/${rounds}` : "";
    pings.push(await drive(`(a) GET /api/ping${of}`, { ...phases.ping, duration: seconds }, pid));
    evaluations.push(await drive(`(b) POST /api/recipes/evaluate${of}`, { ...phases.evaluate, duration: seconds }, pid));
  }
  const ceilingRate = rate(pings);
  // For information, outside the ratio: the same evaluation with every check's wording.
  const evaluateFull = await drive('(b′) POST /api/recipes/evaluate, standards "full"', { ...phases.evaluateFull, duration: seconds }, pid);
  // The cheapest page there is (no database, no session): what Next's rendering alone allows here.
  const signInPage = await drive("(c0) GET /sign-in (page ceiling), 10 connections", { ...phases.signIn, duration: seconds }, pid);
  const list = await drive("(c) GET /recipes (list page), 10 connections", { ...phases.list, duration: seconds }, pid);
  const halfRate = Math.max(1, Math.floor(list.result.requests.average / 2));
  const listAtHalf = await drive(`(c) GET /recipes at ${halfRate} req/s (half of that)`, { ...phases.list, duration: seconds, overallRate: halfRate }, pid);
  const ledger: WriterLedger = { acknowledged: new Map(), refused: [] };
  const save = await drive(
    `(d) POST versions (${WRITERS} writers)`,
    {
      url: `${stack.base}/api/recipes`,
      connections: WRITERS,
      amount: saves,
      setupClient: writerSetup(ws, cookies, stack.base, ledger),
    },
    pid,
  );
  const contended = await contention(ws, cookies, ledger);
  const check = await checkVersions(stack.databaseUrl, ws.workspaceId, ledger.acknowledged);
  const all: Phase[] = [...pings, ...evaluations, evaluateFull, signInPage, list, listAtHalf, save];

  console.log(`\nbench:load — ${new Date().toISOString().slice(0, 10)}, ${cpus().length} cores, ${(totalmem() / 2 ** 30).toFixed(0)} GiB, load average ${load.toFixed(2)} before measuring; large workspace seeded in ${seedSeconds.toFixed(0)} s`);
  console.log(table(all, ceilingRate));
  const evaluateRate = rate(evaluations);
  const cpuOf = (ps: Phase[]) => {
    const known = ps.map((p) => p.cpuMsPerRequest).filter((x): x is number => x !== null);
    return known.length ? (known.reduce((a, b) => a + b, 0) / known.length).toFixed(2) : "–";
  };
  console.log(`ceiling ${ceilingRate.toFixed(0)} req/s (${cpuOf(pings)} ms CPU a request), evaluate ${evaluateRate.toFixed(0)} req/s (${cpuOf(evaluations)} ms): ${((100 * evaluateRate) / ceilingRate).toFixed(0)} % over ${rounds} round(s)`);
  if (ledger.refused.length) console.log(`refused saves (first 3): ${ledger.refused.slice(0, 3).map((r) => `${r.status} ${r.body}`).join(" | ")}`);
  console.log(`versions: expected ${check.expected.toLocaleString("en")}, found ${check.actual.toLocaleString("en")}; recipes with a gap, repeat or wrong latest: ${check.badRecipes}; versions without lines: ${check.withoutLines}`);
  for (const e of check.examples) console.log(`  ${e}`);

  const ratio = evaluateRate / ceilingRate;
  const errors = all.reduce((n, p) => n + failures(p.result), 0);
  const targets: [string, boolean][] = [
    [`evaluate at ≥ 70 % of the ceiling (${(100 * ratio).toFixed(0)} %)`, ratio >= 0.7],
    [`list page p99 < 100 ms (${list.result.latency.p99.toFixed(0)} ms)`, list.result.latency.p99 < 100],
    [`zero errors and non-2xx (${errors})`, errors === 0],
    [`zero lost or duplicated versions (${check.expected - check.actual} lost, ${check.badRecipes} recipes wrong)`, check.expected === check.actual && check.badRecipes === 0 && check.withoutLines === 0 && contended],
  ];
  for (const [label, ok] of targets) console.log(`${ok ? "PASS" : "FAIL"}  ${label}`);
  console.log(`info  list page at ${halfRate} req/s (half its flat-out rate): p50 ${listAtHalf.result.latency.p50.toFixed(0)} ms, p99 ${listAtHalf.result.latency.p99.toFixed(0)} ms`);
  console.log(`info  sign-in page (no database, no session) at 10 connections: p99 ${signInPage.result.latency.p99.toFixed(0)} ms, ${signInPage.cpuMsPerRequest?.toFixed(2) ?? "–"} ms CPU a request`);
  console.log(`bench: done in ${((Date.now() - started) / 1000).toFixed(0)} s`);
  return targets.every(([, ok]) => ok);
}

void withCleanup(stack, main);
