import "server-only";
import Decimal from "decimal.js";
import { and, asc, count, desc, eq, gt, inArray, isNotNull, isNull, sql } from "drizzle-orm";
import { db } from "@/db/client";
import { batches, beanLots, ingredients, memberships, priceQuotes, purchaseOrders, recipes, suppliers } from "@/db/schema";
import type { MoneyResult } from "@/lib/formulation";
import { quotesToCheck } from "@/lib/pricing/quote-checks";
import { loadRecipeCosting } from "./costing";
import { getNibStock } from "./nib-stock";
import { orderListColumns, type OrderListRow } from "./purchase-orders";
import { plain } from "./numeric";
import { quotePairColumns } from "./quotes";

/**
 * What the overview lists: a few rows of each kind of thing waiting on someone,
 * with how many there are in all. Batches, orders, recipes and margins read only
 * `limit` rows (and a count); the price check reads a few columns of every quote
 * (its dates decide), and the bean summary every lot in use with its records.
 */
export type Few<T> = { rows: T[]; total: number };

export type PlannedBatch = {
  id: string;
  code: string;
  recipeName: string;
  versionNo: number;
  plannedFor: string;
  totalMassGrams: string;
  /** Planned for a day before today and still not recorded as made or cancelled. */
  overdue: boolean;
};

/** Planned batches, the earliest day first (overdue ones lead). */
export async function listPlannedBatches({ workspaceId, on, limit = 5 }: { workspaceId: string; on: string; limit?: number }): Promise<Few<PlannedBatch>> {
  const where = and(eq(batches.workspaceId, workspaceId), eq(batches.status, "planned"));
  const [rows, [total]] = await Promise.all([
    db
      .select({
        id: batches.id,
        code: batches.code,
        recipeName: batches.recipeName,
        versionNo: batches.versionNo,
        plannedFor: batches.plannedFor,
        totalMassGrams: batches.totalMassGrams,
      })
      .from(batches)
      .where(where)
      .orderBy(asc(batches.plannedFor), asc(batches.code))
      .limit(limit),
    db.select({ n: count() }).from(batches).where(where),
  ]);
  return {
    rows: rows.map((r) => ({ ...r, totalMassGrams: plain(r.totalMassGrams), overdue: r.plannedFor < on })),
    total: total?.n ?? 0,
  };
}

export type OpenOrder = OrderListRow;

/** Purchase orders not yet received or cancelled: drafts to send, sent ones to receive. Oldest first. */
export async function listOpenPurchaseOrders({ workspaceId, limit = 5 }: { workspaceId: string; limit?: number }): Promise<Few<OpenOrder>> {
  const where = and(eq(purchaseOrders.workspaceId, workspaceId), inArray(purchaseOrders.status, ["drafted", "sent"]));
  const [rows, [total]] = await Promise.all([
    db
      .select(orderListColumns)
      .from(purchaseOrders)
      .innerJoin(suppliers, eq(suppliers.id, purchaseOrders.supplierId))
      .where(where)
      .orderBy(asc(purchaseOrders.createdAt), asc(purchaseOrders.number))
      .limit(limit),
    db.select({ n: count() }).from(purchaseOrders).where(where),
  ]);
  return { rows, total: total?.n ?? 0 };
}

export type UnreleasedRecipe = { id: string; name: string; latestVersionNo: number; releasedVersionNo: number | null; updatedAt: Date };

/** Recipes whose latest saved version is newer than the released one (or that were never released). Most recently changed first. */
export async function listUnreleasedChanges({ workspaceId, limit = 5 }: { workspaceId: string; limit?: number }): Promise<Few<UnreleasedRecipe>> {
  const where = and(
    eq(recipes.workspaceId, workspaceId),
    gt(recipes.latestVersionNo, 0),
    sql`${recipes.latestVersionNo} > coalesce(${recipes.releasedVersionNo}, 0)`,
  );
  const [rows, [total]] = await Promise.all([
    db
      .select({
        id: recipes.id,
        name: recipes.name,
        latestVersionNo: recipes.latestVersionNo,
        releasedVersionNo: recipes.releasedVersionNo,
        updatedAt: recipes.updatedAt,
      })
      .from(recipes)
      .where(where)
      .orderBy(desc(recipes.updatedAt), asc(recipes.id))
      .limit(limit),
    db.select({ n: count() }).from(recipes).where(where),
  ]);
  return { rows, total: total?.n ?? 0 };
}

export type QuoteToCheck = {
  id: string;
  supplierId: string;
  supplierName: string;
  ingredientId: string;
  ingredientName: string;
  validFrom: string;
  validUntil: string | null;
  reason: "ends" | "old";
};

/**
 * Current supplier prices to chase (lib/pricing/quote-checks.ts): ending within
 * 30 days with nothing after them, or in effect for more than six months.
 * Archived suppliers and ingredients are left out.
 */
export async function listQuotesToCheck({ workspaceId, on, limit = 6 }: { workspaceId: string; on: string; limit?: number }): Promise<Few<QuoteToCheck>> {
  const rows = await db
    .select({
      ...quotePairColumns,
      validFrom: priceQuotes.validFrom,
      validUntil: priceQuotes.validUntil,
      createdAt: priceQuotes.createdAt,
    })
    .from(priceQuotes)
    .innerJoin(suppliers, and(eq(suppliers.id, priceQuotes.supplierId), isNull(suppliers.archivedAt)))
    .innerJoin(ingredients, and(eq(ingredients.id, priceQuotes.ingredientId), isNull(ingredients.archivedAt)))
    .where(eq(priceQuotes.workspaceId, workspaceId));
  const checks = quotesToCheck(rows, { on });
  return {
    rows: checks.slice(0, limit).map(({ quote: { createdAt: _entered, ...q }, reason }) => ({ ...q, reason })),
    total: checks.length,
  };
}

export type LotOnHand = { id: string; code: string; originCountry: string; massReceivedKg: string; winnowed: boolean; nibsInStockKg: string };

export type BeansOnHand = {
  /** Nibs out of winnowing, less what completed runs took, over every lot in use. */
  nibsInStockKg: string;
  /** Lots with nibs left, and lots whose beans are not winnowed yet (their nib yield is still an estimate). */
  lots: Few<LotOnHand>;
};

/** Nib stock across the lots in use, and the lots that still hold nibs or beans. Beans not yet winnowed lead. */
export async function getBeansOnHand({ workspaceId, limit = 5 }: { workspaceId: string; limit?: number }): Promise<BeansOnHand> {
  const [lots, stock] = await Promise.all([
    db
      .select({ id: beanLots.id, code: beanLots.code, originCountry: beanLots.originCountry, massReceivedKg: beanLots.massReceivedKg, arrivedOn: beanLots.arrivedOn })
      .from(beanLots)
      .where(and(eq(beanLots.workspaceId, workspaceId), isNull(beanLots.archivedAt)))
      .orderBy(desc(beanLots.arrivedOn), asc(beanLots.code)),
    getNibStock({ workspaceId }),
  ]);
  let total = new Decimal(0);
  const held: LotOnHand[] = [];
  for (const lot of lots) {
    const s = stock.get(lot.id);
    if (!s) continue;
    total = total.plus(s.inStockKg);
    if (!s.winnowed || new Decimal(s.inStockKg).gt(0)) {
      held.push({ id: lot.id, code: lot.code, originCountry: lot.originCountry, massReceivedKg: plain(lot.massReceivedKg), winnowed: s.winnowed, nibsInStockKg: s.inStockKg });
    }
  }
  held.sort((a, b) => Number(a.winnowed) - Number(b.winnowed));
  return { nibsInStockKg: total.isZero() ? "0" : total.toFixed(), lots: { rows: held.slice(0, limit), total: held.length } };
}

export type ReleasedMargin = {
  recipeId: string;
  name: string;
  versionNo: number;
  currency: string;
  /** Cost per bar with the recipe's chosen suppliers and cost settings at today's quotes, or why it could not be costed. */
  costPerBar: string | null;
  problem: string | null;
  wholesalePricePerBar: string | null;
  wholesaleMargin: MoneyResult | null;
  wholesaleTargetPercent: string | null;
  retailPricePerBar: string | null;
  retailMargin: MoneyResult | null;
  retailTargetPercent: string | null;
  /** The margin at the entered price is under its target. */
  wholesaleBelowTarget: boolean;
  retailBelowTarget: boolean;
};

const under = (margin: MoneyResult | null, target: string | null) => !!margin?.ok && target !== null && new Decimal(margin.value).lt(target);

/**
 * The released version of each released recipe (alphabetically, `limit` of
 * them) costed as the Costing page does — the chosen combination of suppliers
 * and the recipe's cost settings at the quotes valid on `on` — with its
 * margins at the selling prices entered. Money: call only for a viewer who may
 * see costs (lib/cost-visibility/overview.ts).
 */
export async function listReleasedMargins({ workspaceId, on, limit = 8 }: { workspaceId: string; on: string; limit?: number }): Promise<Few<ReleasedMargin>> {
  const where = and(eq(recipes.workspaceId, workspaceId), isNotNull(recipes.releasedVersionNo));
  const [released, [total]] = await Promise.all([
    db
      .select({ id: recipes.id, versionNo: recipes.releasedVersionNo })
      .from(recipes)
      .where(where)
      .orderBy(asc(recipes.name), asc(recipes.id))
      .limit(limit),
    db.select({ n: count() }).from(recipes).where(where),
  ]);
  const rows = await Promise.all(
    released.map(async ({ id, versionNo }) => {
      const c = await loadRecipeCosting({ workspaceId, recipeId: id, versionNo: versionNo ?? undefined, on });
      const { cost, margins } = c.report.scenarios.chosen;
      const s = c.settings;
      const wholesaleMargin = margins?.wholesaleMargin ?? null;
      const retailMargin = margins?.retailMargin ?? null;
      return {
        recipeId: id,
        name: c.recipe.name,
        versionNo: c.version.versionNo,
        currency: c.baseCurrency,
        costPerBar: cost.ok ? cost.costPerBar : null,
        problem: cost.ok ? c.currencyProblem : cost.reason,
        wholesalePricePerBar: s.wholesalePricePerBar,
        wholesaleMargin,
        wholesaleTargetPercent: s.wholesaleMarginPercent,
        retailPricePerBar: s.retailPricePerBar,
        retailMargin,
        retailTargetPercent: s.retailMarginPercent,
        wholesaleBelowTarget: under(wholesaleMargin, s.wholesaleMarginPercent),
        retailBelowTarget: under(retailMargin, s.retailMarginPercent),
      } satisfies ReleasedMargin;
    }),
  );
  return { rows, total: total?.n ?? 0 };
}

export type SetupStep = "supplier" | "quote" | "recipe" | "release" | "lot" | "batch" | "team";

/** The first things a new workspace does, in order; `done` from what its tables hold. */
export type SetupProgress = { step: SetupStep; done: boolean }[];

const SETUP_ORDER: SetupStep[] = ["supplier", "quote", "recipe", "release", "lot", "batch", "team"];

/**
 * How far a workspace has come from an empty start: a supplier, a price, a
 * saved recipe, a released version, a bean lot, a batch, a second person.
 * One round trip of EXISTS checks, each on an index led by workspace_id.
 */
export async function getSetupProgress({ workspaceId }: { workspaceId: string }): Promise<SetupProgress> {
  const exists = (table: typeof suppliers | typeof priceQuotes | typeof beanLots | typeof batches) =>
    sql<boolean>`exists (select 1 from ${table} where ${table.workspaceId} = ${workspaceId})`;
  const [row] = await db
    .select({
      supplier: exists(suppliers),
      quote: exists(priceQuotes),
      recipe: sql<boolean>`exists (select 1 from ${recipes} where ${recipes.workspaceId} = ${workspaceId} and ${recipes.latestVersionNo} > 0)`,
      release: sql<boolean>`exists (select 1 from ${recipes} where ${recipes.workspaceId} = ${workspaceId} and ${recipes.releasedVersionNo} is not null)`,
      lot: exists(beanLots),
      batch: exists(batches),
      team: sql<boolean>`(select count(*) from ${memberships} where ${memberships.workspaceId} = ${workspaceId}) > 1`,
    })
    .from(sql`(select 1) as one`);
  return SETUP_ORDER.map((step) => ({ step, done: row?.[step] === true }));
}
