/**
 * Seeds the load benchmark's large workspace next to the demo: 10,000 recipes
 * with 10 versions each (and their lines), 200 ingredients, 20 suppliers,
 * 2,000 quotes and 500 bean lots, all generated (scripts/bench/generate.ts).
 *
 * Versions are real: a pool of 40 formulations per chocolate type is evaluated
 * by the engine exactly as a save does (computeVersion), and each version takes
 * one of them; the bulk rows are then written by PostgreSQL itself
 * (INSERT … SELECT over generate_series, 1,000 recipes a statement), so the
 * 20 kB evaluations never cross the wire 100,000 times.
 */
import Decimal from "decimal.js";
import { drizzle, type NodePgDatabase } from "drizzle-orm/node-postgres";
import { Client } from "pg";
import * as schema from "../../db/schema";
import { beanLots, ingredients, memberships, priceQuotes, recipes, suppliers, users, workspaces, type ChocolateType } from "../../db/schema";
import { hashPassword } from "../../lib/auth/password";
import { DEFAULT_INGREDIENTS } from "../../lib/formulation";
import { referenceIngredientRow } from "../../lib/ingredients/reference-rows";
import { computeVersion, type ResolvedLine } from "../../lib/data/recipes-rows";
import { toStored } from "../../lib/recipes/figures";
import { GENERATED_TYPES, ORIGINS, formulations, lotCode, producerName, recipeName, stableUuid, supplierName, type FormulationLine } from "./generate";

export const LARGE = { recipes: 10_000, versionsEach: 10, variants: 20, suppliers: 20, quotesEach: 10, lots: 500, pool: 40, chunk: 1_000 };
export const LARGE_USER = { email: "formulator@quillfield-generated.example", name: "Generated Formulator", password: "generated-bench-only-77" };

export type LargeWorkspace = { workspaceId: string; userId: string; recipeIds: string[]; ingredientIds: Map<string, string[]> };

/** Which pool formulation version `v` of recipe `seq` uses (the SQL below says the same). */
const poolIndex = (seq: number, v: number) => (seq * 7 + v * 13) % LARGE.pool;

export async function seedLargeWorkspace(databaseUrl: string, log: (s: string) => void): Promise<LargeWorkspace> {
  const client = new Client({ connectionString: databaseUrl });
  await client.connect();
  const db = drizzle(client, { schema });
  try {
    const workspaceId = stableUuid("workspace");
    await db.insert(workspaces).values({ id: workspaceId, name: "Quillfield Test Kitchen (generated)", slug: "quillfield-generated", baseCurrency: "EUR" });
    const userId = stableUuid("user");
    await db.insert(users).values({ id: userId, email: LARGE_USER.email, name: LARGE_USER.name, passwordHash: await hashPassword(LARGE_USER.password) });
    await db.insert(memberships).values({ workspaceId, userId, role: "formulator" });

    const supplierIds = Array.from({ length: LARGE.suppliers }, (_, i) => stableUuid(`supplier-${i}`));
    await db.insert(suppliers).values(supplierIds.map((id, i) => ({ id, workspaceId, name: supplierName(i), currency: "EUR", leadTimeDays: 7 + (i % 5) * 7 })));

    // 20 variants of each of the 10 reference profiles; each bought first from supplier (i mod 20).
    const rows: (typeof ingredients.$inferInsert)[] = [];
    const ingredientIds = new Map<string, string[]>();
    const prices = new Map<string, string>();
    DEFAULT_INGREDIENTS.forEach((profile, p) => {
      const base = referenceIngredientRow(profile);
      const ids: string[] = [];
      for (let v = 0; v < LARGE.variants; v++) {
        const i = p * LARGE.variants + v;
        const id = stableUuid(`ingredient-${i}`);
        ids.push(id);
        rows.push({ ...base, id, workspaceId, name: `${base.name} (generated ${String(v + 1).padStart(2, "0")})`, referenceKey: null, preferredSupplierId: supplierIds[i % LARGE.suppliers]! });
      }
      ingredientIds.set(profile.key, ids);
    });
    await db.insert(ingredients).values(rows);

    // 10 quotes per ingredient from 10 suppliers; the preferred supplier's (k = 0) is current from 2026-01-01.
    const quotes: (typeof priceQuotes.$inferInsert)[] = [];
    rows.forEach((row, i) => {
      for (let k = 0; k < LARGE.quotesEach; k++) {
        const price = new Decimal(1.2 + ((i * 37 + k * 11) % 200) / 10).toFixed(2);
        if (k === 0) prices.set(row.id!, price);
        quotes.push({ workspaceId, supplierId: supplierIds[(i + k) % LARGE.suppliers]!, ingredientId: row.id!, price, currency: "EUR", unit: "per_kg", validFrom: `2026-${String(1 + (k % 6)).padStart(2, "0")}-01`, source: "generated", dedupeKey: `generated-${i}-${k}`, createdById: userId });
      }
    });
    await db.insert(priceQuotes).values(quotes);

    await db.insert(beanLots).values(
      Array.from({ length: LARGE.lots }, (_, i) => ({
        workspaceId,
        code: lotCode(i),
        supplierId: supplierIds[i % 4]!,
        originCountry: ORIGINS[i % ORIGINS.length]!,
        producer: producerName(i),
        harvestYear: 2025,
        arrivedOn: `2026-${String(1 + (i % 11)).padStart(2, "0")}-${String(1 + (i % 27)).padStart(2, "0")}`,
        massReceivedKg: String(60 + (i % 10) * 45),
        pricePaid: String(400 + (i % 17) * 130),
        currency: "EUR",
        createdById: userId,
      })),
    );
    log(`bench: large workspace: ${rows.length} ingredients, ${quotes.length} quotes, ${LARGE.lots} lots`);

    const pool = await evaluatePool(client, rows, prices, ingredientIds);
    const recipeIds = await insertRecipes(client, db, { workspaceId, userId, pool, log });
    return { workspaceId, userId, recipeIds, ingredientIds };
  } finally {
    await client.end();
  }
}

type PoolEntry = { cocoa: string | null; costPerKg: string | null; costPerBar: string | null };

/** Evaluates the formulation pool with the engine and keeps it in temporary tables for the bulk inserts. */
async function evaluatePool(client: Client, rows: (typeof ingredients.$inferInsert)[], prices: Map<string, string>, ids: Map<string, string[]>) {
  await client.query(`create temp table bench_formulations (type chocolate_type, idx int, evaluation jsonb, cocoa numeric, cost_per_kg numeric, cost_per_bar numeric, primary key (type, idx))`);
  await client.query(`create temp table bench_formulation_lines (type chocolate_type, idx int, position int, ingredient_id uuid, percent numeric, primary key (type, idx, position))`);
  const byId = new Map(rows.map((r) => [r.id!, r]));
  const out = new Map<string, PoolEntry>();
  for (const type of ["dark", "milk", "white"] as ChocolateType[]) {
    const list = formulations(type, LARGE.pool, LARGE.variants);
    for (const [idx, lines] of list.entries()) {
      const resolved = lines.map((l: FormulationLine): ResolvedLine => {
        const row = byId.get(ids.get(l.key)![l.variant]!)!;
        return {
          percent: l.percent,
          ingredient: {
            id: row.id!, name: row.name, kind: row.kind, archived: false, isInclusion: row.isInclusion ?? false, allergens: row.allergens ?? [], pricePerKg: prices.get(row.id!) ?? null,
            cocoaButter: row.cocoaButter!, cocoaSolidsNonFat: row.cocoaSolidsNonFat!, milkFat: row.milkFat!, milkSolidsNonFat: row.milkSolidsNonFat!, sugar: row.sugar!, vegetableFat: row.vegetableFat!, moisture: row.moisture!,
          },
        };
      });
      const { evaluation, figures } = computeVersion(resolved, "70");
      const entry = { cocoa: toStored(figures.cocoaPercent), costPerKg: toStored(figures.costPerKg), costPerBar: toStored(figures.costPerBar) };
      out.set(`${type}:${idx}`, entry);
      await client.query(`insert into bench_formulations values ($1, $2, $3, $4, $5, $6)`, [type, idx, JSON.stringify(evaluation), entry.cocoa, entry.costPerKg, entry.costPerBar]);
      for (const [position, r] of resolved.entries()) {
        await client.query(`insert into bench_formulation_lines values ($1, $2, $3, $4, $5)`, [type, idx, position, r.ingredient.id, r.percent]);
      }
    }
  }
  return out;
}

async function insertRecipes(
  client: Client,
  db: NodePgDatabase<typeof schema>,
  { workspaceId, userId, pool, log }: { workspaceId: string; userId: string; pool: Map<string, PoolEntry>; log: (s: string) => void },
): Promise<string[]> {
  await client.query(`create temp table bench_map (seq int primary key, recipe_id uuid, type chocolate_type, created_at timestamptz)`);
  const start = Date.parse("2026-01-05T08:00:00Z");
  const ids: string[] = [];
  const t0 = Date.now();
  for (let lo = 0; lo < LARGE.recipes; lo += LARGE.chunk) {
    const batch = Array.from({ length: Math.min(LARGE.chunk, LARGE.recipes - lo) }, (_, k) => {
      const seq = lo + k;
      const type = GENERATED_TYPES[seq % GENERATED_TYPES.length]!;
      const latest = pool.get(`${type}:${poolIndex(seq, LARGE.versionsEach)}`)!;
      const createdAt = new Date(start + seq * 23 * 60_000);
      return { seq, type, createdAt, latest, id: stableUuid(`recipe-${seq}`) };
    });
    await db.insert(recipes).values(
      batch.map((b) => ({
        id: b.id, workspaceId, name: recipeName(b.seq, b.type), chocolateType: b.type, targetCocoaPercent: b.type === "dark" ? "70" : b.type === "milk" ? "40" : null,
        origin: "scratch" as const, createdById: userId, latestVersionNo: LARGE.versionsEach, barMassGrams: "70",
        cocoaPercent: b.latest.cocoa, costPerBar: b.latest.costPerBar,
        releasedVersionNo: b.seq % 5 === 0 ? 8 : null, releasedAt: b.seq % 5 === 0 ? new Date(b.createdAt.getTime() + 9 * 3_600_000) : null,
        createdAt: b.createdAt, updatedAt: new Date(b.createdAt.getTime() + LARGE.versionsEach * 3_600_000),
      })),
    );
    const values = batch.map((_, k) => `($${k * 4 + 1}::int, $${k * 4 + 2}::uuid, $${k * 4 + 3}::chocolate_type, $${k * 4 + 4}::timestamptz)`).join(",");
    await client.query(`insert into bench_map values ${values}`, batch.flatMap((b) => [b.seq, b.id, b.type, b.createdAt.toISOString()]));
    const range: [number, number] = [lo, lo + batch.length];
    await client.query(
      `insert into recipe_versions (workspace_id, recipe_id, version_no, based_on_version_no, note, author_id, bar_mass_grams, cocoa_percent, cost_per_kg, cost_per_bar, evaluation, created_at)
       select $1, m.recipe_id, v, nullif(v - 1, 0), 'Generated version ' || v, $2, 70, f.cocoa, f.cost_per_kg, f.cost_per_bar, f.evaluation, m.created_at + v * interval '1 hour'
       from bench_map m cross join generate_series(1, ${LARGE.versionsEach}) v
       join bench_formulations f on f.type = m.type and f.idx = (m.seq * 7 + v * 13) % ${LARGE.pool}
       where m.seq >= $3 and m.seq < $4`,
      [workspaceId, userId, ...range],
    );
    await client.query(
      `insert into recipe_version_lines (version_id, position, ingredient_id, percent, ingredient_name, cocoa_butter, cocoa_solids_non_fat, milk_fat, milk_solids_non_fat, sugar, vegetable_fat, moisture, is_inclusion, allergens, price_per_kg)
       select rv.id, fl.position, fl.ingredient_id, fl.percent, i.name, i.cocoa_butter, i.cocoa_solids_non_fat, i.milk_fat, i.milk_solids_non_fat, i.sugar, i.vegetable_fat, i.moisture, i.is_inclusion, i.allergens,
              (select q.price from price_quotes q where q.ingredient_id = i.id and q.supplier_id = i.preferred_supplier_id order by q.valid_from desc limit 1)
       from bench_map m join recipe_versions rv on rv.recipe_id = m.recipe_id
       join bench_formulation_lines fl on fl.type = m.type and fl.idx = (m.seq * 7 + rv.version_no * 13) % ${LARGE.pool}
       join ingredients i on i.id = fl.ingredient_id
       where m.seq >= $1 and m.seq < $2`,
      range,
    );
    await client.query(
      `insert into recipe_releases (workspace_id, recipe_id, version_id, version_no, note, released_by_id, created_at)
       select $1, m.recipe_id, rv.id, rv.version_no, 'Generated release', $2, rv.created_at + interval '1 hour'
       from bench_map m join recipe_versions rv on rv.recipe_id = m.recipe_id and rv.version_no = 8
       where m.seq % 5 = 0 and m.seq >= $3 and m.seq < $4`,
      [workspaceId, userId, ...range],
    );
    ids.push(...batch.map((b) => b.id));
    log(`bench: recipes ${range[1].toLocaleString("en")}/${LARGE.recipes.toLocaleString("en")} with ${LARGE.versionsEach} versions each (${((Date.now() - t0) / 1000).toFixed(0)} s)`);
  }
  // What an operator does after a bulk load, so that autovacuum's first pass over the new rows
  // and the checkpoint of the load do not fall on the measurements.
  await client.query("vacuum (analyze)");
  await client.query("checkpoint");
  return ids;
}
