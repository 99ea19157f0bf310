/**
 * A bounded write load through the real HTTP endpoints: writers saving recipe
 * versions (POST /api/recipes/:id/versions, re-reading the latest on 409) and
 * writers importing one-row price lists (POST /api/price-lists), each request
 * with a timeout so a hang shows up as a failure, never as a stuck test.
 */
import { FAULT_BASE_URL, writeHeaders } from "./fault-stack";

export type Outcome = { kind: "version" | "import"; status: number; ms: number; at: number; versionNo?: number; recipeId?: string; price?: string; body: string };
export type RecipeToSave = { id: string; barMassGrams: string; lines: { ingredientId: string; percent: string }[]; base: number };

const REQUEST_TIMEOUT_MS = 10_000;

async function timed(kind: Outcome["kind"], url: string, init: RequestInit): Promise<Outcome> {
  const started = Date.now();
  try {
    const res = await fetch(url, { ...init, signal: AbortSignal.timeout(REQUEST_TIMEOUT_MS) });
    return { kind, status: res.status, ms: Date.now() - started, at: started, body: await res.text() };
  } catch (err) {
    // 0: no answer within the timeout (a hang) or the connection failed.
    return { kind, status: 0, ms: Date.now() - started, at: started, body: String(err) };
  }
}

export async function versionWriter(cookie: string, recipe: RecipeToSave, running: () => boolean, out: Outcome[]): Promise<void> {
  while (running()) {
    const body = JSON.stringify({ baseVersionNo: recipe.base, barMassGrams: recipe.barMassGrams, lines: recipe.lines, note: "fault test save" });
    const o = await timed("version", `${FAULT_BASE_URL}/api/recipes/${recipe.id}/versions`, { method: "POST", headers: writeHeaders(cookie, "application/json"), body });
    o.recipeId = recipe.id;
    if (o.status === 201) {
      o.versionNo = (JSON.parse(o.body) as { versionNo: number }).versionNo;
      recipe.base = Math.max(recipe.base, o.versionNo);
    } else if (o.status === 409) {
      const latest = await fetch(`${FAULT_BASE_URL}/api/recipes/${recipe.id}/versions/latest`, { headers: { cookie }, signal: AbortSignal.timeout(REQUEST_TIMEOUT_MS) }).catch(() => null);
      if (latest?.ok) recipe.base = ((await latest.json()) as { version: { versionNo: number } }).version.versionNo;
    } else {
      await new Promise((r) => setTimeout(r, 100)); // the database is away: do not spin
    }
    out.push(o);
  }
}

let priceCounter = 0;

export async function importWriter(cookie: string, supplierId: string, running: () => boolean, out: Outcome[]): Promise<void> {
  while (running()) {
    // A price no other row has, so each import is new and can be found again by it.
    const price = `3.${String(++priceCounter).padStart(4, "0")}`;
    const csv = `Product,Price,Currency,Unit,Valid from\r\nSugar (sucrose),${price},GBP,kg,2026-11-01\r\n`;
    const form = new FormData();
    form.set("supplierId", supplierId);
    form.set("file", new File([csv], `fault-${price}.csv`, { type: "text/csv" }));
    const o = await timed("import", `${FAULT_BASE_URL}/api/price-lists`, { method: "POST", headers: writeHeaders(cookie), body: form });
    o.price = price;
    if (o.status !== 200) await new Promise((r) => setTimeout(r, 100));
    out.push(o);
  }
}
