/**
 * Faults, against a second production server on its own cluster
 * (tests/e2e/support/fault-stack.ts): PostgreSQL stopped in the middle of a
 * write load and started again; the app process killed in the middle of a
 * price-list import. Named zz- so it runs after the other browser tests.
 */
import type { ChildProcess } from "node:child_process";
import type { Client } from "pg";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { FAULT_BASE_URL, databaseScript, destroyCluster, sessionCookie, sql, startApp, startCluster, stderr, waitForHealth, writeHeaders } from "./support/fault-stack";
import { importWriter, versionWriter, type Outcome, type RecipeToSave } from "./support/write-load";

let app: ChildProcess;
let db: Client;
let cookie: string;
let workspaceId: string;
let supplierId: string;

beforeAll(async () => {
  await startCluster();
  app = await startApp();
  db = await sql();
  ({ cookie, workspaceId } = await sessionCookie(db, "mara@fenwicklane.example"));
  const s = await db.query<{ id: string }>("select id from suppliers where workspace_id = $1 and name = 'Saltmarsh Sugar Company'", [workspaceId]);
  supplierId = s.rows[0]!.id;
}, 180_000);

afterAll(async () => {
  app?.kill("SIGKILL");
  await db?.end().catch(() => undefined);
  destroyCluster();
});

/** Two demo recipes with their latest version's lines, to save again and again. */
async function recipesToSave(): Promise<RecipeToSave[]> {
  const { rows } = await db.query<{ id: string; version_id: string; version_no: number; bar_mass_grams: string }>(
    `select distinct on (r.id) r.id, v.id as version_id, v.version_no, v.bar_mass_grams
       from recipes r join recipe_versions v on v.recipe_id = r.id
      where r.workspace_id = $1 order by r.id, v.version_no desc limit 2`,
    [workspaceId],
  );
  const out: RecipeToSave[] = [];
  for (const r of rows) {
    const lines = await db.query<{ ingredient_id: string; percent: string }>("select ingredient_id, percent from recipe_version_lines where version_id = $1 order by position", [r.version_id]);
    out.push({ id: r.id, base: r.version_no, barMassGrams: r.bar_mass_grams, lines: lines.rows.map((l) => ({ ingredientId: l.ingredient_id, percent: l.percent })) });
  }
  return out;
}

describe("hostile text stored as data", () => {
  it("renders escaped: an injected <script> name shows as text on the suppliers page", async () => {
    const name = `<script>alert("fault-${Date.now()}")</script>`;
    const row = await db.query<{ id: string }>("insert into suppliers (workspace_id, name, currency) values ($1, $2, 'EUR') returning id", [workspaceId, name]);
    const res = await fetch(`${FAULT_BASE_URL}/suppliers/${row.rows[0]!.id}`, { headers: { cookie }, signal: AbortSignal.timeout(15_000) });
    expect(res.status).toBe(200);
    const html = await res.text();
    expect(html).toContain(`&lt;script&gt;alert(&quot;fault-`);
    expect(html).not.toContain(`<script>alert("fault-`);
  });
});

describe("PostgreSQL stopping in the middle of a write load", () => {
  const outcomes: Outcome[] = [];
  const outage = { from: 0, to: 0 };
  let recipes: RecipeToSave[];
  let startVersion: Record<string, number>;

  it("answers 503 quickly while the database is away, then recovers by itself", async () => {
    recipes = await recipesToSave();
    expect(recipes).toHaveLength(2);
    startVersion = Object.fromEntries(recipes.map((r) => [r.id, r.base]));
    let running = true;
    const writers = [
      ...recipes.flatMap((r) => [versionWriter(cookie, r, () => running, outcomes), versionWriter(cookie, r, () => running, outcomes)]),
      importWriter(cookie, supplierId, () => running, outcomes),
      importWriter(cookie, supplierId, () => running, outcomes),
    ];
    await new Promise((r) => setTimeout(r, 2_500));
    const pid = app.pid;

    outage.from = Date.now();
    await db.end(); // this test's own connection would die with the server
    await databaseScript("stop");
    // While it is away: the health route, a write and a page each answer at once, clearly.
    const health = await fetch(`${FAULT_BASE_URL}/api/health`, { signal: AbortSignal.timeout(5_000) });
    expect(health.status).toBe(503);
    const page = await fetch(`${FAULT_BASE_URL}/recipes`, { headers: { cookie }, redirect: "manual", signal: AbortSignal.timeout(8_000) });
    expect(page.status).toBe(307);
    const location = page.headers.get("location") ?? "";
    expect(location).toMatch(/\/unavailable\?from=%2Frecipes$/);
    const shown = await fetch(new URL(location, FAULT_BASE_URL), { signal: AbortSignal.timeout(5_000) });
    expect(shown.status).toBe(503);
    expect(shown.headers.get("retry-after")).toBe("30");
    const html = await shown.text();
    expect(html).toContain("Barwright cannot reach its database right now");
    expect(html).toContain("Nothing you saved is lost");
    expect(html).not.toMatch(/at \w+ \(|node_modules|ECONNREFUSED/);
    await new Promise((r) => setTimeout(r, 2_000));
    await databaseScript("start");
    outage.to = Date.now();

    expect(await waitForHealth(30_000, app)).toBe(true);
    db = await sql();
    await new Promise((r) => setTimeout(r, 2_500));
    running = false;
    await Promise.all(writers);

    // The same process throughout: recovered without a restart.
    expect(app.exitCode).toBeNull();
    expect(app.pid).toBe(pid);
    const during = outcomes.filter((o) => o.at >= outage.from && o.at + o.ms <= outage.to);
    expect(during.filter((o) => o.status === 503).length, "requests during the outage").toBeGreaterThan(0);
    for (const o of during.filter((x) => x.status === 503)) expect(JSON.parse(o.body)).toMatchObject({ error: { code: "unavailable" } });
    const after = outcomes.filter((o) => o.at > outage.to + 1_000);
    expect(after.some((o) => o.kind === "version" && o.status === 201), "a version saved after recovery").toBe(true);
    expect(after.some((o) => o.kind === "import" && o.status === 200), "an import after recovery").toBe(true);
  }, 120_000);

  it("never answered 500 or hung", () => {
    const tally = new Map<string, number>();
    for (const o of outcomes) tally.set(`${o.kind} ${o.status}`, (tally.get(`${o.kind} ${o.status}`) ?? 0) + 1);
    const statuses = [...tally].sort().map(([k, n]) => `${k}: ${n}`);
    console.log(`faults: ${outcomes.length} writes, slowest ${Math.max(...outcomes.map((o) => o.ms))} ms; ${statuses.join(", ")}`);
    expect(outcomes.filter((o) => o.status === 0 || o.status >= 500 && o.status !== 503), statuses.join(", ")).toEqual([]);
    expect(Math.max(...outcomes.map((o) => o.ms)), "slowest request (ms)").toBeLessThan(10_000);
    expect(stderr(app)).not.toContain("route handler failed");
  });

  it("lost nothing that got a 2xx and left no half-written version or import", async () => {
    for (const r of recipes) {
      const versions = await db.query<{ version_no: number; lines: string; total: string }>(
        `select v.version_no, count(l.id) as lines, coalesce(sum(l.percent), 0) as total
           from recipe_versions v left join recipe_version_lines l on l.version_id = v.id
          where v.recipe_id = $1 group by v.version_no order by v.version_no`,
        [r.id],
      );
      const numbers = versions.rows.map((v) => v.version_no);
      expect(numbers, "version numbers: 1..n, no gaps").toEqual(numbers.map((_, i) => i + 1));
      for (const v of versions.rows.filter((x) => x.version_no > startVersion[r.id]!)) {
        expect(Number(v.lines), `v${v.version_no} lines`).toBe(r.lines.length);
        expect(Number(v.total), `v${v.version_no} percent`).toBe(100);
      }
      const saved = outcomes.filter((o) => o.recipeId === r.id && o.status === 201).map((o) => o.versionNo);
      expect(new Set(saved).size, "each 201 a different version").toBe(saved.length);
      for (const n of saved) expect(numbers).toContain(n);
    }
    const imported = outcomes.filter((o) => o.kind === "import" && o.status === 200).map((o) => o.price!);
    const quotes = await db.query<{ price: string }>("select price::text from price_quotes where workspace_id = $1 and source like 'price-list:%' and price >= 3 and price < 4", [workspaceId]);
    const stored = quotes.rows.map((q) => Number(q.price).toFixed(4));
    for (const p of imported) expect(stored).toContain(p);
    // Every upload record has exactly the quotes it counts (none half-written).
    const records = await db.query<{ id: string; imported_count: number; quotes: string }>(
      `select i.id, i.imported_count, (select count(*) from price_quotes q where q.source = 'price-list:' || i.id) as quotes
         from price_list_imports i where i.workspace_id = $1`,
      [workspaceId],
    );
    for (const rec of records.rows) expect(Number(rec.quotes), rec.id).toBe(rec.imported_count);
  });
});

describe("the app process killed in the middle of a price-list import", () => {
  it("leaves none of that import, and the restarted app imports the same file whole", async () => {
    const rows = 2_000;
    const csv = ["Product,Price,Currency,Unit,Valid from", ...Array.from({ length: rows }, (_, i) => `Sugar (sucrose),4.${String(i).padStart(4, "0")},GBP,kg,2026-11-02`)].join("\r\n");
    const upload = () => {
      const form = new FormData();
      form.set("supplierId", supplierId);
      form.set("file", new File([csv], "kill-test.csv", { type: "text/csv" }));
      return fetch(`${FAULT_BASE_URL}/api/price-lists`, { method: "POST", headers: writeHeaders(cookie), body: form, signal: AbortSignal.timeout(30_000) });
    };
    const counts = async () => {
      const r = await db.query<{ imports: string; quotes: string }>(
        `select (select count(*) from price_list_imports where workspace_id = $1 and file_name = 'kill-test.csv') as imports,
                (select count(*) from price_quotes where workspace_id = $1 and price >= 4 and price < 5) as quotes`,
        [workspaceId],
      );
      return { imports: Number(r.rows[0]!.imports), quotes: Number(r.rows[0]!.quotes) };
    };

    // Hold the quotes table so the import's transaction stops half-way: its upload record written, its quotes waiting.
    const holder = await sql();
    await holder.query("begin");
    await holder.query("lock table price_quotes in share mode");
    const request = upload().catch((err: Error) => err);
    let caught = false;
    for (let i = 0; i < 100 && !caught; i++) {
      const waiting = await db.query(
        "select 1 from pg_stat_activity where datname = current_database() and wait_event_type = 'Lock' and xact_start is not null and query ilike 'insert into \"price_quotes\"%'",
      );
      caught = waiting.rowCount! > 0;
      if (!caught) await new Promise((r) => setTimeout(r, 100));
    }
    expect(caught, "the import was caught inside its transaction").toBe(true);
    app.kill("SIGKILL");
    await new Promise((r) => app.once("exit", r));
    await holder.query("rollback");
    await holder.end();
    expect(await request).toBeInstanceOf(Error); // the client saw the connection drop, not a success

    // PostgreSQL ends the orphaned transaction once it finds its client gone.
    for (let i = 0; i < 50; i++) {
      const left = await db.query("select 1 from pg_stat_activity where datname = current_database() and query ilike 'insert into \"price_quotes\"%' and state <> 'idle'");
      if (left.rowCount === 0) break;
      await new Promise((r) => setTimeout(r, 100));
    }
    expect(await counts()).toEqual({ imports: 0, quotes: 0 });

    app = await startApp();
    const again = await upload();
    expect(again.status).toBe(200);
    expect(((await again.json()) as { imported: number }).imported).toBe(rows);
    expect(await counts()).toEqual({ imports: 1, quotes: rows });
  }, 90_000);
});
