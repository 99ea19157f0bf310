import "server-only";
import { and, desc, eq } from "drizzle-orm";
import { db } from "@/db/client";
import { priceListImports, priceQuotes, suppliers, users } from "@/db/schema";
import { invalid } from "@/lib/errors";
import { checkPriceList, type PriceListCheck } from "@/lib/price-lists/check";

export type ImportOutcome = {
  importId: string;
  imported: number;
  /** Rows already recorded before (or repeated in the file), skipped. */
  duplicates: number;
  invalid: number;
  check: PriceListCheck;
};

/**
 * Imports a checked price list: every valid new row becomes a quote, all in
 * ONE transaction with the upload's record, so a failure leaves nothing half
 * imported. Invalid rows are skipped (their reasons are in `check`); rows
 * already recorded are skipped by the dedupe key, so uploading the same file
 * again adds nothing.
 */
export async function importPriceList(
  args: Parameters<typeof checkPriceList>[0] & { userId: string },
): Promise<ImportOutcome> {
  const check = await checkPriceList(args);
  const unmapped = Object.entries(check.mappingProblems);
  if (unmapped.length > 0) {
    throw invalid(unmapped.map(([, m]) => m).join(" "), Object.fromEntries(unmapped.map(([f, m]) => [`mapping.${f}`, [m]])));
  }
  const fresh = check.rows.filter((r) => r.status === "new");
  if (fresh.length === 0 && check.counts.already_imported === 0 && check.counts.duplicate_in_file === 0) {
    throw invalid("No row of this file can be imported. Fix the rows listed and upload it again.");
  }
  return db.transaction(async (tx) => {
    const [record] = await tx
      .insert(priceListImports)
      .values({
        workspaceId: args.workspaceId,
        supplierId: check.supplier.id,
        fileName: args.fileName.slice(0, 200),
        fileSha256: check.fileSha256,
        encoding: check.encoding,
        rowCount: check.rows.length,
        importedCount: 0,
        duplicateCount: 0,
        invalidCount: check.counts.invalid,
        createdById: args.userId,
      })
      .returning({ id: priceListImports.id });
    const importId = record!.id;
    const inserted = fresh.length
      ? await tx
          .insert(priceQuotes)
          .values(
            fresh.map((r) => ({
              workspaceId: args.workspaceId,
              supplierId: check.supplier.id,
              ingredientId: r.ingredientId!,
              ...r.quote!,
              source: `price-list:${importId}`,
              dedupeKey: r.dedupeKey!,
              createdById: args.userId,
            })),
          )
          .onConflictDoNothing({ target: [priceQuotes.workspaceId, priceQuotes.dedupeKey] })
          .returning({ id: priceQuotes.id })
      : [];
    const duplicates = check.rows.length - check.counts.invalid - inserted.length;
    await tx
      .update(priceListImports)
      .set({ importedCount: inserted.length, duplicateCount: duplicates })
      .where(eq(priceListImports.id, importId));
    return { importId, imported: inserted.length, duplicates, invalid: check.counts.invalid, check };
  });
}

export type PriceListImportRecord = {
  id: string;
  supplierId: string;
  supplierName: string;
  fileName: string;
  encoding: string;
  rowCount: number;
  importedCount: number;
  duplicateCount: number;
  invalidCount: number;
  createdAt: string;
  createdByName: string | null;
};

/** Past price-list uploads, newest first (optionally one supplier's). */
export async function listPriceListImports({
  workspaceId,
  supplierId,
}: {
  workspaceId: string;
  supplierId?: string;
}): Promise<PriceListImportRecord[]> {
  const rows = await db
    .select({
      id: priceListImports.id,
      supplierId: priceListImports.supplierId,
      supplierName: suppliers.name,
      fileName: priceListImports.fileName,
      encoding: priceListImports.encoding,
      rowCount: priceListImports.rowCount,
      importedCount: priceListImports.importedCount,
      duplicateCount: priceListImports.duplicateCount,
      invalidCount: priceListImports.invalidCount,
      createdAt: priceListImports.createdAt,
      createdByName: users.name,
    })
    .from(priceListImports)
    .innerJoin(suppliers, eq(suppliers.id, priceListImports.supplierId))
    .leftJoin(users, eq(users.id, priceListImports.createdById))
    .where(and(eq(priceListImports.workspaceId, workspaceId), supplierId ? eq(priceListImports.supplierId, supplierId) : undefined))
    .orderBy(desc(priceListImports.createdAt))
    .limit(50);
  return rows.map((r) => ({ ...r, createdAt: r.createdAt.toISOString() }));
}
