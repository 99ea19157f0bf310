/**
 * A purchase order as the supplier receives it: a plain-text e-mail and a CSV
 * attachment (RFC 4180, safe for spreadsheets). Pure. Lines ordered at 0 kg are
 * left out: the buyer dropped them from the draft.
 */
import Decimal from "decimal.js";
import { toCsv } from "@/lib/csv/export";

type DocLine = {
  position: number;
  ingredientName: string;
  quantityKg: string;
  packKg: string | null;
  packs: number | null;
  price: string | null;
  currency: string | null;
  priceUnit: string | null;
  amount: string | null;
};
type DocOrder = { number: string; supplierName: string; notes: string | null; lines: DocLine[]; totals: Record<string, string> };

const UNIT_LABEL: Record<string, string> = { per_kg: "per kg", per_pack: "per pack", per_tonne: "per tonne" };
const money = (v: string) => new Decimal(v).toFixed(2);
const ordered = (o: DocOrder) => o.lines.filter((l) => new Decimal(l.quantityKg).gt(0));

export const orderFileName = (o: { number: string }) => `${o.number}.csv`;

export function orderCsv(order: DocOrder): string {
  return toCsv(
    [
      { header: "Order", value: () => order.number },
      { header: "Line", value: (l: DocLine) => l.position },
      { header: "Item", value: (l: DocLine) => l.ingredientName },
      { header: "Quantity (kg)", value: (l: DocLine) => new Decimal(l.quantityKg).toFixed() },
      { header: "Packs", value: (l: DocLine) => l.packs ?? "" },
      { header: "Pack size (kg)", value: (l: DocLine) => (l.packKg ? new Decimal(l.packKg).toFixed() : "") },
      { header: "Price", value: (l: DocLine) => (l.price ? new Decimal(l.price).toFixed() : "") },
      { header: "Currency", value: (l: DocLine) => l.currency ?? "" },
      { header: "Price unit", value: (l: DocLine) => (l.priceUnit ? UNIT_LABEL[l.priceUnit] : "") },
      { header: "Amount", value: (l: DocLine) => (l.amount ? money(l.amount) : "") },
    ],
    ordered(order),
  );
}

export function orderMailText(order: DocOrder, workspaceName: string): string {
  const lines = ordered(order).map((l) => {
    const packs = l.packs !== null && l.packKg ? ` (${l.packs} × ${new Decimal(l.packKg).toFixed()} kg)` : "";
    const price = l.price && l.currency && l.priceUnit ? ` at ${l.currency} ${new Decimal(l.price).toFixed()} ${UNIT_LABEL[l.priceUnit]}` : "";
    return `  ${l.position}. ${l.ingredientName}: ${new Decimal(l.quantityKg).toFixed()} kg${packs}${price}`;
  });
  const totals = Object.entries(order.totals).map(([c, v]) => `${c} ${money(v)}`);
  return [
    `Hello ${order.supplierName},`,
    "",
    `please supply the following for our order ${order.number}:`,
    "",
    ...lines,
    "",
    totals.length ? `Order value at your quoted prices: ${totals.join(" + ")}.` : "",
    order.notes ? `Notes: ${order.notes}` : "",
    "The order is attached as a CSV file. Please confirm the delivery date and quote our order number on the delivery note.",
    "",
    `${workspaceName}`,
  ]
    .filter((l, i, all) => l !== "" || all[i - 1] !== "")
    .join("\n");
}
