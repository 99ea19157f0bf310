import "server-only";
import { pool } from "@/db/client";
import { currentQuote, quotePerKgInBase, type DatedRate, type PriceUnit } from "@/lib/pricing/convert";
import type { BenchIngredient } from "@/lib/recipes/types";
import { plain } from "./numeric";

type Quote = { price: string; currency: string; unit: PriceUnit; packKg: string | null; validFrom: string; validUntil: string | null; createdAt: string };

type Row = Omit<BenchIngredient, "pricePerKg" | "archived"> & { archived: boolean; baseCurrency: string; quotes: Quote[]; rates: DatedRate[] };

const PRICED_INGREDIENTS = `
  select i.id, i.name, i.kind::text as kind,
    i.cocoa_butter::text as "cocoaButter", i.cocoa_solids_non_fat::text as "cocoaSolidsNonFat", i.milk_fat::text as "milkFat",
    i.milk_solids_non_fat::text as "milkSolidsNonFat", i.sugar::text as sugar, i.vegetable_fat::text as "vegetableFat", i.moisture::text as moisture,
    i.is_inclusion as "isInclusion", i.allergens, i.archived_at is not null as archived, w.base_currency::text as "baseCurrency",
    coalesce((select json_agg(json_build_object('price', q.price::text, 'currency', q.currency::text, 'unit', q.unit::text, 'packKg', q.pack_kg::text,
                'validFrom', q.valid_from::text, 'validUntil', q.valid_until::text, 'createdAt', q.created_at))
              from price_quotes q
              where q.workspace_id = i.workspace_id and q.ingredient_id = i.id and q.supplier_id = i.preferred_supplier_id), '[]'::json) as quotes,
    coalesce((select json_agg(json_build_object('currency', r.currency::text, 'rateToBase', r.rate_to_base::text, 'validOn', r.valid_on::text))
              from exchange_rates r where r.workspace_id = i.workspace_id), '[]'::json) as rates
  from ingredients i join workspaces w on w.id = i.workspace_id
  where i.workspace_id = $1 and ($2::uuid[] is null or i.id = any($2::uuid[]))`;

/**
 * The named ingredients of the workspace with today's price, in ONE round trip:
 * composition, allergens, the preferred supplier's quotes and the workspace's
 * base currency and rates, then the price rule of getCurrentPrices (the current
 * quote on `on`, converted with the latest rate on or before it; lib/pricing).
 * What a save reads on every request (and the evaluate API through
 * library-cache.ts); ids that are not this workspace's are simply absent.
 * "all" reads the whole library.
 */
export async function loadPricedIngredients({ workspaceId, ingredientIds, on }: { workspaceId: string; ingredientIds: readonly string[] | "all"; on: string }): Promise<Map<string, BenchIngredient>> {
  const ids = ingredientIds === "all" ? null : [...new Set(ingredientIds)];
  if (ids?.length === 0) return new Map();
  // A named statement: each connection plans it once and reuses the plan.
  const { rows } = await pool.query<Row>({ name: "priced-ingredients", text: PRICED_INGREDIENTS, values: [workspaceId, ids] });
  const out = new Map<string, BenchIngredient>();
  for (const { baseCurrency, quotes, rates, ...r } of rows) {
    const quote = currentQuote(quotes, on);
    const converted = quote ? quotePerKgInBase(quote, { base: baseCurrency, rates: rates.map((x) => ({ ...x, rateToBase: plain(x.rateToBase) })), on }) : null;
    out.set(r.id, { ...r, pricePerKg: converted?.ok ? converted.value.perKg : null });
  }
  return out;
}
