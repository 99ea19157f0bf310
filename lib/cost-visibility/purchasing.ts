import "server-only";
import { canSeeCosts } from "@/lib/auth/costs";
import type { Viewer } from "@/lib/auth/current";
import { getPurchaseOrder, type OrderDetail } from "@/lib/data/purchase-orders";
import { materialRequirements, type RequirementLine, type RequirementQuote, type SupplierGroup } from "@/lib/data/requirements";

/** A requirement line as the viewer may see it: the quote's packs and minimum stay, its price may not. */
export type VisibleRequirementLine = Omit<RequirementLine, "quote"> & { quote: (Omit<RequirementQuote, "price"> & { price: string | null }) | null };
export type VisibleSupplierGroup = Omit<SupplierGroup, "lines"> & { lines: VisibleRequirementLine[] };

export function withoutRequirementMoney(groups: SupplierGroup[]): VisibleSupplierGroup[] {
  return groups.map((g) => ({ ...g, lines: g.lines.map((l) => ({ ...l, quote: l.quote ? { ...l.quote, price: null } : null, amount: null })) }));
}

/** An order without its prices, line amounts and totals (quantities and packs stay). */
export function withoutOrderMoney(order: OrderDetail): OrderDetail {
  return { ...order, lines: order.lines.map((l) => ({ ...l, price: null, amount: null })), totals: {} };
}

/** Material requirements for the requirements page, with quote prices and amounts only for those who may see costs. */
export async function materialRequirementsForViewer({ viewer, batchIds }: { viewer: Viewer; batchIds: readonly string[] }) {
  const [{ groups }, costsShown] = await Promise.all([materialRequirements({ workspaceId: viewer.workspace.id, batchIds }), canSeeCosts(viewer)]);
  return { groups: costsShown ? (groups as VisibleSupplierGroup[]) : withoutRequirementMoney(groups), costsShown };
}

/** One purchase order for its page, its value only for those who may see costs. */
export async function getPurchaseOrderForViewer({ viewer, orderId }: { viewer: Viewer; orderId: string }) {
  const [order, costsShown] = await Promise.all([getPurchaseOrder({ workspaceId: viewer.workspace.id, orderId }), canSeeCosts(viewer)]);
  return { order: costsShown ? order : withoutOrderMoney(order), costsShown };
}
