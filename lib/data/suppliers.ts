import "server-only";
import { and, asc, count, eq, isNull, isNotNull } from "drizzle-orm";
import { db } from "@/db/client";
import { attachments, ingredients, priceListImports, priceQuotes, suppliers } from "@/db/schema";
import { conflict, notFound } from "@/lib/errors";
import type { SupplierInput } from "@/lib/validation/suppliers";
import { isUniqueViolation } from "./pg-errors";

export type SupplierSummary = {
  id: string;
  name: string;
  contactName: string | null;
  email: string | null;
  currency: string;
  leadTimeDays: number | null;
  notes: string | null;
  archived: boolean;
  quoteCount: number;
};

const columns = {
  id: suppliers.id,
  name: suppliers.name,
  contactName: suppliers.contactName,
  email: suppliers.email,
  currency: suppliers.currency,
  leadTimeDays: suppliers.leadTimeDays,
  notes: suppliers.notes,
  archivedAt: suppliers.archivedAt,
};

/** The workspace's suppliers by name, with how many quotes each has given. */
export async function listSuppliers({
  workspaceId,
  archived = "exclude",
}: {
  workspaceId: string;
  archived?: "include" | "exclude" | "only";
}): Promise<SupplierSummary[]> {
  const filter =
    archived === "exclude" ? isNull(suppliers.archivedAt) : archived === "only" ? isNotNull(suppliers.archivedAt) : undefined;
  const rows = await db
    .select({ ...columns, quoteCount: count(priceQuotes.id) })
    .from(suppliers)
    .leftJoin(priceQuotes, eq(priceQuotes.supplierId, suppliers.id))
    .where(and(eq(suppliers.workspaceId, workspaceId), filter))
    .groupBy(suppliers.id)
    .orderBy(asc(suppliers.name));
  return rows.map(({ archivedAt, ...r }) => ({ ...r, archived: archivedAt !== null }));
}

/** One supplier of the workspace, or a not-found error. */
export async function getSupplierById({ workspaceId, supplierId }: { workspaceId: string; supplierId: string }): Promise<SupplierSummary> {
  const [row] = await db
    .select({ ...columns, quoteCount: count(priceQuotes.id) })
    .from(suppliers)
    .leftJoin(priceQuotes, eq(priceQuotes.supplierId, suppliers.id))
    .where(and(eq(suppliers.workspaceId, workspaceId), eq(suppliers.id, supplierId)))
    .groupBy(suppliers.id);
  if (!row) throw notFound("That supplier");
  const { archivedAt, ...rest } = row;
  return { ...rest, archived: archivedAt !== null };
}

function nameTaken(err: unknown, name: string): never {
  if (isUniqueViolation(err, "suppliers_workspace_name")) throw conflict(`A supplier named “${name}” already exists.`);
  throw err;
}

export async function createSupplier({ workspaceId, input }: { workspaceId: string; input: SupplierInput }): Promise<{ id: string }> {
  try {
    const [row] = await db
      .insert(suppliers)
      .values({ workspaceId, ...input, email: input.email ?? null })
      .returning({ id: suppliers.id });
    return { id: row!.id };
  } catch (err) {
    nameTaken(err, input.name);
  }
}

export async function updateSupplier({
  workspaceId,
  supplierId,
  input,
}: {
  workspaceId: string;
  supplierId: string;
  input: SupplierInput;
}): Promise<void> {
  try {
    const done = await db
      .update(suppliers)
      .set({ ...input, email: input.email ?? null })
      .where(and(eq(suppliers.workspaceId, workspaceId), eq(suppliers.id, supplierId)))
      .returning({ id: suppliers.id });
    if (done.length === 0) throw notFound("That supplier");
  } catch (err) {
    nameTaken(err, input.name);
  }
}

/** Archives (or restores) a supplier: hidden from new choices, its history kept. */
export async function setSupplierArchived({
  workspaceId,
  supplierId,
  archived,
}: {
  workspaceId: string;
  supplierId: string;
  archived: boolean;
}): Promise<void> {
  const done = await db
    .update(suppliers)
    .set({ archivedAt: archived ? new Date() : null })
    .where(and(eq(suppliers.workspaceId, workspaceId), eq(suppliers.id, supplierId)))
    .returning({ id: suppliers.id });
  if (done.length === 0) throw notFound("That supplier");
}

/**
 * Deletes a supplier nothing refers to. Quotes, price-list uploads, files and
 * preferred-supplier choices are history or links worth keeping: with any of
 * them the delete is refused with what refers to it, and archiving is offered.
 */
export async function deleteSupplier({ workspaceId, supplierId }: { workspaceId: string; supplierId: string }): Promise<void> {
  await db.transaction(async (tx) => {
    const [supplier] = await tx
      .select({ id: suppliers.id, name: suppliers.name })
      .from(suppliers)
      .where(and(eq(suppliers.workspaceId, workspaceId), eq(suppliers.id, supplierId)))
      .for("update");
    if (!supplier) throw notFound("That supplier");
    const countOf = async (table: typeof priceQuotes | typeof priceListImports | typeof attachments) =>
      (await tx.select({ n: count() }).from(table).where(eq(table.supplierId, supplierId)))[0]?.n ?? 0;
    const [quotes, uploads, files] = [await countOf(priceQuotes), await countOf(priceListImports), await countOf(attachments)];
    const preferredBy = await tx
      .select({ name: ingredients.name })
      .from(ingredients)
      .where(and(eq(ingredients.workspaceId, workspaceId), eq(ingredients.preferredSupplierId, supplierId)));
    const uses = [
      plural(quotes, "price quote"),
      plural(uploads, "price-list upload"),
      plural(files, "file"),
      preferredBy.length ? `the preferred-supplier choice of ${preferredBy.map((i) => i.name).join(", ")}` : null,
    ].filter((u): u is string => u !== null);
    if (uses.length > 0) {
      throw conflict(`${supplier.name} cannot be deleted: ${listing(uses)} still refer to it. Archive it instead; its history stays.`);
    }
    await tx.delete(suppliers).where(and(eq(suppliers.workspaceId, workspaceId), eq(suppliers.id, supplierId)));
  });
}

/** "3 price quotes", "1 file", or null for none. */
export function plural(n: number, noun: string): string | null {
  return n === 0 ? null : `${n} ${noun}${n === 1 ? "" : "s"}`;
}

/** "a", "a and b", "a, b and c". */
export function listing(items: readonly string[]): string {
  return items.length <= 1 ? (items[0] ?? "") : `${items.slice(0, -1).join(", ")} and ${items[items.length - 1]}`;
}
