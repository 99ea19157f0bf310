import "server-only";
import { and, desc, eq } from "drizzle-orm";
import { db } from "@/db/client";
import { recipeCostSettings, users, type RecipeCostSettingsRow } from "@/db/schema";
import { DEFAULT_COST_SETTINGS, type CostSettings } from "@/lib/costing";
import { conflict } from "@/lib/errors";
import type { CostSettingsInput } from "@/lib/validation/costing";
import { plain } from "./numeric";
import { isUniqueViolation } from "./pg-errors";
import { getRecipe, lockRecipe } from "./recipes";

export type CostSettingsRecord = {
  settings: CostSettings;
  /** 0 when nothing has been entered yet (the defaults: ingredients only). */
  revision: number;
  /** The base currency the amounts were entered in; null for the defaults. */
  currency: string | null;
  note: string | null;
  createdAt: Date | null;
  createdByName: string | null;
};

const nullablePlain = (v: string | null) => (v === null ? null : plain(v));

function toSettings(row: RecipeCostSettingsRow): CostSettings {
  return {
    processLossPercent: plain(row.processLossPercent),
    packagingPerBar: plain(row.packagingPerBar),
    labourPerBar: plain(row.labourPerBar),
    labourPerKg: plain(row.labourPerKg),
    overheadPerBar: plain(row.overheadPerBar),
    overheadPerKg: plain(row.overheadPerKg),
    barsPerCase: row.barsPerCase,
    wholesaleMarginPercent: nullablePlain(row.wholesaleMarginPercent),
    retailMarginPercent: nullablePlain(row.retailMarginPercent),
    wholesalePricePerBar: nullablePlain(row.wholesalePricePerBar),
    retailPricePerBar: nullablePlain(row.retailPricePerBar),
    batchKg: nullablePlain(row.batchKg),
    needWithinDays: row.needWithinDays,
  };
}

/** The recipe's settings revisions, newest first (`limit` of them). */
export async function listCostSettings({ workspaceId, recipeId, limit = 20 }: { workspaceId: string; recipeId: string; limit?: number }): Promise<CostSettingsRecord[]> {
  const rows = await db
    .select({ row: recipeCostSettings, createdByName: users.name })
    .from(recipeCostSettings)
    .leftJoin(users, eq(users.id, recipeCostSettings.createdById))
    .where(and(eq(recipeCostSettings.workspaceId, workspaceId), eq(recipeCostSettings.recipeId, recipeId)))
    .orderBy(desc(recipeCostSettings.revision))
    .limit(limit);
  return rows.map(({ row, createdByName }) => ({
    settings: toSettings(row),
    revision: row.revision,
    currency: row.currency,
    note: row.note,
    createdAt: row.createdAt,
    createdByName,
  }));
}

/** The recipe's current settings (its latest revision), or the defaults with revision 0. */
export async function getCostSettings({ workspaceId, recipeId }: { workspaceId: string; recipeId: string }): Promise<CostSettingsRecord> {
  const [latest] = await listCostSettings({ workspaceId, recipeId, limit: 1 });
  return latest ?? { settings: DEFAULT_COST_SETTINGS, revision: 0, currency: null, note: null, createdAt: null, createdByName: null };
}

/**
 * Writes a new revision of the recipe's settings, in `currency` (the base
 * currency now). Refused with a conflict when someone saved since the form was
 * filled (`expectedRevision` is not the latest): nothing is overwritten unseen.
 */
export async function saveCostSettings({
  workspaceId,
  userId,
  currency,
  input,
}: {
  workspaceId: string;
  userId: string;
  currency: string;
  input: CostSettingsInput;
}): Promise<{ revision: number }> {
  const { recipeId, expectedRevision, note, ...values } = input;
  await getRecipe({ workspaceId, recipeId });
  try {
    return await db.transaction(async (tx) => {
      // Saves of one recipe's settings queue on the recipe's row.
      await lockRecipe(tx, { workspaceId, recipeId });
      const [latest] = await tx
        .select({ revision: recipeCostSettings.revision })
        .from(recipeCostSettings)
        .where(eq(recipeCostSettings.recipeId, recipeId))
        .orderBy(desc(recipeCostSettings.revision))
        .limit(1);
      const current = latest?.revision ?? 0;
      if (current !== expectedRevision) throw changedMeanwhile(current);
      await tx.insert(recipeCostSettings).values({ ...values, workspaceId, recipeId, revision: current + 1, currency, note, createdById: userId });
      return { revision: current + 1 };
    });
  } catch (err) {
    if (isUniqueViolation(err, "recipe_cost_settings_revision")) throw changedMeanwhile(expectedRevision + 1);
    throw err;
  }
}

const changedMeanwhile = (revision: number) =>
  conflict(`Someone saved these cost settings since you opened them (now revision ${revision}). Reload to see their figures, then make your change again.`);
