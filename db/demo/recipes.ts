/**
 * Demo recipes of Fenwick Lane Chocolate Works: a 70 % dark, an 82 % dark, a
 * 45 % milk, a 34 % white and a dark with 15 % roasted hazelnuts. Figures are
 * Barwright's own; every version is computed by the engine like a real save,
 * with the demo quotes valid on its (back-dated) day. Authored by the
 * formulator. Idempotent: a recipe whose name exists is left alone.
 */
import { and, eq, inArray } from "drizzle-orm";
import { ingredientsInTransaction, insertVersionRows } from "../../lib/data/recipes-rows";
import { DEFAULT_INGREDIENTS } from "../../lib/formulation";
import { referenceIngredientRow } from "../../lib/ingredients/reference-rows";
import { isoDay } from "../../lib/pricing/convert";
import { ingredients, recipeReleases, recipes, type ChocolateType } from "../schema";
import type { DemoContext, DemoSeeder } from "./context";

const HAZELNUTS = "Roasted hazelnuts";
type Key = "cocoa-nibs" | "cocoa-butter" | "sucrose" | "whole-milk-powder" | "soy-lecithin" | "vanilla" | typeof HAZELNUTS;
type DemoVersion = { daysAgo: number; note: string; lines: [Key, string][]; release?: string };
type DemoRecipe = { name: string; type: ChocolateType; target: string; notes: string; versions: DemoVersion[] };

const DEMO_RECIPES: DemoRecipe[] = [
  {
    name: "House dark 70 %",
    type: "dark",
    target: "70",
    notes: "The everyday bar. Nibs from the Ecuador lots.",
    versions: [
      { daysAgo: 120, note: "First trial from the classic dark.", lines: [["cocoa-nibs", "62"], ["cocoa-butter", "8"], ["sucrose", "29.6"], ["soy-lecithin", "0.4"]] },
      { daysAgo: 90, note: "Up to 70 % dry cocoa solids.", release: "Approved after the tasting panel.", lines: [["cocoa-nibs", "64"], ["cocoa-butter", "7.3"], ["sucrose", "28.4"], ["soy-lecithin", "0.3"]] },
      { daysAgo: 20, note: "A touch of vanilla, in tasting.", lines: [["cocoa-nibs", "64"], ["cocoa-butter", "7.3"], ["sucrose", "28.3"], ["soy-lecithin", "0.3"], ["vanilla", "0.1"]] },
    ],
  },
  {
    name: "Deep dark 82 %",
    type: "dark",
    target: "82",
    notes: "Short run for the winter market.",
    versions: [
      { daysAgo: 75, note: "Started from the 70 % with less sugar.", lines: [["cocoa-nibs", "74"], ["cocoa-butter", "8"], ["sucrose", "17.7"], ["soy-lecithin", "0.3"]] },
      { daysAgo: 60, note: "82 % on the label.", release: "Winter run.", lines: [["cocoa-nibs", "76"], ["cocoa-butter", "7.6"], ["sucrose", "16.1"], ["soy-lecithin", "0.3"]] },
    ],
  },
  {
    name: "Harbour milk 45 %",
    type: "milk",
    target: "45",
    notes: "A dark milk chocolate.",
    versions: [
      { daysAgo: 100, note: "First milk trial.", lines: [["cocoa-nibs", "30"], ["cocoa-butter", "14"], ["whole-milk-powder", "22"], ["sucrose", "33.6"], ["soy-lecithin", "0.4"]] },
      { daysAgo: 70, note: "45 % cocoa.", release: "Shop and market.", lines: [["cocoa-nibs", "32"], ["cocoa-butter", "13.7"], ["whole-milk-powder", "22"], ["sucrose", "31.9"], ["soy-lecithin", "0.4"]] },
      { daysAgo: 12, note: "Creamier: more milk powder, less sugar.", lines: [["cocoa-nibs", "32"], ["cocoa-butter", "13.7"], ["whole-milk-powder", "24"], ["sucrose", "29.9"], ["soy-lecithin", "0.4"]] },
    ],
  },
  {
    name: "Quayside white 34 %",
    type: "white",
    target: "34",
    notes: "Deodorised cocoa butter keeps it clean.",
    versions: [
      { daysAgo: 80, note: "34 % cocoa butter.", release: "First white in the shop.", lines: [["cocoa-butter", "34"], ["whole-milk-powder", "27"], ["sucrose", "38.6"], ["soy-lecithin", "0.3"], ["vanilla", "0.1"]] },
      { daysAgo: 30, note: "One point more milk powder.", lines: [["cocoa-butter", "34"], ["whole-milk-powder", "28"], ["sucrose", "37.6"], ["soy-lecithin", "0.3"], ["vanilla", "0.1"]] },
    ],
  },
  {
    name: "Hazelnut dark, 15 % roasted hazelnuts",
    type: "dark",
    target: "70",
    notes: "Whole roasted hazelnuts folded in before moulding.",
    versions: [
      { daysAgo: 95, note: "15 % hazelnuts in the house dark.", release: "Autumn bar.", lines: [["cocoa-nibs", "57"], ["cocoa-butter", "6"], ["sucrose", "21.7"], ["soy-lecithin", "0.3"], [HAZELNUTS, "15"]] },
      { daysAgo: 40, note: "A little more cocoa under the nuts.", lines: [["cocoa-nibs", "58"], ["cocoa-butter", "6"], ["sucrose", "20.7"], ["soy-lecithin", "0.3"], [HAZELNUTS, "15"]] },
    ],
  },
];

/** Library ids for the keys, adding a reference profile or the hazelnut inclusion if the library lacks it. */
async function ingredientIds({ tx, workspaceId }: DemoContext): Promise<Map<Key, string>> {
  const ids = new Map<Key, string>();
  const refs = DEFAULT_INGREDIENTS.filter((p) => ["cocoa-nibs", "cocoa-butter", "sucrose", "whole-milk-powder", "soy-lecithin", "vanilla"].includes(p.key));
  const found = await tx
    .select({ id: ingredients.id, key: ingredients.referenceKey, name: ingredients.name })
    .from(ingredients)
    .where(and(eq(ingredients.workspaceId, workspaceId), inArray(ingredients.name, [...refs.map((p) => p.name), HAZELNUTS])));
  for (const p of refs) {
    const row = found.find((f) => f.key === p.key || f.name === p.name);
    const id = row?.id ?? (await tx.insert(ingredients).values({ ...referenceIngredientRow(p), workspaceId }).returning({ id: ingredients.id }))[0]!.id;
    ids.set(p.key as Key, id);
  }
  const nut = found.find((f) => f.name === HAZELNUTS);
  const nutId =
    nut?.id ??
    (await tx
      .insert(ingredients)
      .values({ workspaceId, name: HAZELNUTS, kind: "inclusion", isInclusion: true, moisture: "2.5", allergens: ["nuts"], source: "Demo data (figures from memory, verify)." })
      .returning({ id: ingredients.id }))[0]!.id;
  ids.set(HAZELNUTS, nutId);
  return ids;
}

const daysAgo = (n: number) => new Date(Date.now() - n * 86_400_000);

export const seedRecipes: DemoSeeder = async (ctx) => {
  const { tx, workspaceId, people } = ctx;
  const ids = await ingredientIds(ctx);
  for (const demo of DEMO_RECIPES) {
    const [exists] = await tx.select({ id: recipes.id }).from(recipes).where(and(eq(recipes.workspaceId, workspaceId), eq(recipes.name, demo.name)));
    if (exists) continue;
    const first = demo.versions[0]!;
    const [recipe] = await tx
      .insert(recipes)
      .values({ workspaceId, name: demo.name, chocolateType: demo.type, targetCocoaPercent: demo.target, notes: demo.notes, barMassGrams: "70", createdById: people.formulator, createdAt: daysAgo(first.daysAgo) })
      .returning({ id: recipes.id });
    for (const [i, v] of demo.versions.entries()) {
      const at = daysAgo(v.daysAgo);
      const byId = await ingredientsInTransaction(tx, { workspaceId, ingredientIds: v.lines.map(([k]) => ids.get(k)!), on: isoDay(at) });
      const lines = v.lines.map(([k, percent]) => ({ ingredient: byId.get(ids.get(k)!)!, percent }));
      const { versionId } = await insertVersionRows(tx, {
        workspaceId,
        recipeId: recipe!.id,
        versionNo: i + 1,
        basedOnVersionNo: i === 0 ? null : i,
        note: v.note,
        authorId: people.formulator,
        barMassGrams: "70",
        lines,
        createdAt: at,
      });
      if (v.release) {
        const releasedAt = new Date(at.getTime() + 2 * 86_400_000);
        await tx.insert(recipeReleases).values({ workspaceId, recipeId: recipe!.id, versionId, versionNo: i + 1, note: v.release, releasedById: people.formulator, createdAt: releasedAt });
        await tx.update(recipes).set({ releasedVersionNo: i + 1, releasedAt, updatedAt: releasedAt }).where(eq(recipes.id, recipe!.id));
      }
    }
  }
};
