import { readdirSync, readFileSync } from "node:fs";
import path from "node:path";
import { and, eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { db } from "@/db/client";
import { ingredients, priceQuotes, purchaseOrders, stockMovements } from "@/db/schema";
import { AppError } from "@/lib/errors";
import { getCurrentPrices } from "@/lib/data/prices";
import { cancelPurchaseOrder, receivePurchaseOrder, sendPurchaseOrder, updatePurchaseOrder } from "@/lib/data/purchase-order-status";
import { draftPurchaseOrder, getPurchaseOrder } from "@/lib/data/purchase-orders";
import { materialRequirements } from "@/lib/data/requirements";
import { orderCsv } from "@/lib/purchasing/order-document";
import { lotWithNibs, planTestBatch, productionSetup } from "../support/batches";
import { createTeam, type TeamFixture } from "../support/fixtures";
import { makeQuote, makeSupplier } from "../support/ingredients";
import { insertTestOrder, supplierWithEmail } from "../support/purchases";
import { referenceIds } from "../support/recipe-fixtures";

type CapturedMail = { to: string; subject: string; text: string; attachments?: { filename: string; contentType: string; size: number }[] };

function mailsTo(address: string): CapturedMail[] {
  const dir = path.resolve(process.env.BARWRIGHT_MAILBOX_DIR!);
  return readdirSync(dir)
    .filter((f) => f.endsWith(".json"))
    .map((f) => JSON.parse(readFileSync(path.join(dir, f), "utf8")) as CapturedMail)
    .filter((m) => m.to.includes(address));
}

async function failure(promise: Promise<unknown>): Promise<AppError> {
  const err = await promise.then(
    () => null,
    (e: unknown) => e,
  );
  if (!(err instanceof AppError)) throw new Error(`expected an AppError, got ${String(err)}`);
  return err;
}

let team: TeamFixture;
let supplier: Awaited<ReturnType<typeof supplierWithEmail>>;
let ids: Awaited<ReturnType<typeof referenceIds>>;
let batchIds: string[];

beforeAll(async () => {
  team = await createTeam("orders");
  const setup = await productionSetup(team);
  ids = await referenceIds(team.workspaceId);
  supplier = await supplierWithEmail(team.workspaceId);
  for (const id of [ids.sugar, ids.butter]) await db.update(ingredients).set({ preferredSupplierId: supplier.id }).where(eq(ingredients.id, id));
  // Invented demo-style quotes: sugar GBP 24 per 25 kg pack with a 50 kg minimum order; cocoa butter EUR 19.8 per kg.
  await makeQuote(team.workspaceId, team.people.buyer.id, { supplierId: supplier.id, ingredientId: ids.sugar, price: "24", currency: "GBP", unit: "per_pack", packKg: "25", minimumOrderKg: "50", validFrom: "2026-01-01" });
  await makeQuote(team.workspaceId, team.people.buyer.id, { supplierId: supplier.id, ingredientId: ids.butter, price: "19.8", validFrom: "2026-01-01" });
  await db.insert(stockMovements).values({ workspaceId: team.workspaceId, ingredientId: ids.butter, kind: "opening", massKg: "2" });
  await lotWithNibs(team.workspaceId, "10");
  batchIds = [(await planTestBatch(team, setup)).id, (await planTestBatch(team, setup)).id];
});

describe("material requirements", () => {
  it("totals two 25 kg batches against stock, grouped by preferred supplier, rounded to packs and minimums", async () => {
    const { groups } = await materialRequirements({ workspaceId: team.workspaceId, batchIds, on: "2026-12-01" });
    const mine = groups.find((g) => g.supplierId === supplier.id)!;
    expect(mine.lines.map((l) => [l.ingredientName, l.neededKg, l.onHandKg, l.shortKg, l.order.quantityKg, l.order.packs, l.amount])).toEqual([
      ["Cocoa butter", "3.65", "2", "1.65", "2", null, "39.6"], // 2 × 1.825 kg; 2 kg opening stock; whole kg; 2 × 19.8
      ["Sugar (sucrose)", "14.2", "0", "14.2", "50", 2, "48"], // 2 × 7.1 kg; 50 kg minimum = 2 packs × GBP 24
    ]);
    const none = groups.find((g) => g.supplierId === null)!;
    const nibs = none.lines.find((l) => l.kind === "nibs")!;
    expect([nibs.neededKg, nibs.onHandKg, nibs.shortKg, nibs.fromLots]).toEqual(["32", "10", "22", true]); // 10 kg of nibs in the lot
  });
});

describe("a purchase order from drafted to received", () => {
  it("drafts, checks edits, sends with the CSV attached, and receives into stock and quotes", async () => {
    const { id, number } = await draftPurchaseOrder({ workspaceId: team.workspaceId, userId: team.people.buyer.id, supplierId: supplier.id, batchIds });
    expect(number).toMatch(/^PO-\d{4}-\d{4}$/);
    let order = await getPurchaseOrder({ workspaceId: team.workspaceId, orderId: id });
    expect(order.status).toBe("drafted");
    expect(order.batchIds.sort()).toEqual([...batchIds].sort());
    expect(order.totals).toEqual({ EUR: "39.6", GBP: "48" });

    // The draft is on order now: the same batches lack nothing more from this supplier.
    const again = await materialRequirements({ workspaceId: team.workspaceId, batchIds, on: "2026-12-01" });
    expect(again.groups.find((g) => g.supplierId === supplier.id)!.lines.map((l) => l.shortKg)).toEqual(["0", "0"]);
    expect((await failure(draftPurchaseOrder({ workspaceId: team.workspaceId, userId: null, supplierId: supplier.id, batchIds }))).message).toMatch(/Nothing to order/);

    const sugar = order.lines.find((l) => l.ingredientId === ids.sugar)!;
    const butter = order.lines.find((l) => l.ingredientId === ids.butter)!;
    const edit = (quantityKg: string) =>
      updatePurchaseOrder({ workspaceId: team.workspaceId, orderId: id, notes: null, lines: [{ lineId: sugar.id, quantityKg, price: null }] });
    expect((await failure(edit("60"))).fieldErrors?.["lines.0.quantityKg"]).toEqual(["Order whole packs of 25 kg."]);
    expect((await failure(edit("25"))).fieldErrors?.["lines.0.quantityKg"]).toEqual(["The minimum order is 50 kg."]);
    await updatePurchaseOrder({ workspaceId: team.workspaceId, orderId: id, notes: "Deliver before the 10th.", lines: [{ lineId: sugar.id, quantityKg: "75", price: "23.5" }] });
    order = await getPurchaseOrder({ workspaceId: team.workspaceId, orderId: id });
    expect(order.lines.find((l) => l.id === sugar.id)).toMatchObject({ quantityKg: "75", packs: 3, price: "23.5", amount: "70.5" });

    const sent = await sendPurchaseOrder({ workspaceId: team.workspaceId, orderId: id });
    expect(sent.sentTo).toBe(supplier.email);
    const [mail] = mailsTo(supplier.email);
    expect(mail!.subject).toBe(`Purchase order ${number} from orders works`);
    expect(mail!.text).toContain("Sugar (sucrose): 75 kg (3 × 25 kg) at GBP 23.5 per pack");
    expect(mail!.text).toContain("Notes: Deliver before the 10th.");
    const csv = orderCsv(await getPurchaseOrder({ workspaceId: team.workspaceId, orderId: id }));
    expect(mail!.attachments).toEqual([{ filename: `${number}.csv`, contentType: "text/csv", size: Buffer.byteLength(csv) }]);
    expect((await failure(sendPurchaseOrder({ workspaceId: team.workspaceId, orderId: id }))).code).toBe("conflict");
    expect(mailsTo(supplier.email)).toHaveLength(1);

    await receivePurchaseOrder({ workspaceId: team.workspaceId, orderId: id, userId: team.people.buyer.id, receivedOn: "2026-12-09" });
    order = await getPurchaseOrder({ workspaceId: team.workspaceId, orderId: id });
    expect([order.status, order.receivedOn]).toEqual(["received", "2026-12-09"]);
    const received = await db.select().from(stockMovements).where(and(eq(stockMovements.orderId, id), eq(stockMovements.kind, "received")));
    expect(received.map((m) => [m.ingredientId, m.massKg]).sort()).toEqual([[butter.ingredientId, "2.000"], [sugar.ingredientId, "75.000"]].sort());
    const quotes = await db.select().from(priceQuotes).where(and(eq(priceQuotes.workspaceId, team.workspaceId), eq(priceQuotes.source, `purchase order ${number}`)));
    expect(quotes).toHaveLength(2);
    const price = (await getCurrentPrices({ workspaceId: team.workspaceId, ingredientIds: [ids.butter], on: "2026-12-09" }))[ids.butter]!;
    expect(price.status === "priced" && price.quoted.validFrom).toBe("2026-12-09");
    // Stock is now 2 + 2 kg of butter and 75 kg of sugar: nothing on order, nothing short.
    const after = await materialRequirements({ workspaceId: team.workspaceId, batchIds, on: "2026-12-09" });
    expect(after.groups.find((g) => g.supplierId === supplier.id)!.lines.map((l) => [l.onHandKg, l.onOrderKg, l.shortKg])).toEqual([
      ["4", "0", "0"],
      ["75", "0", "0"],
    ]);
    expect((await failure(receivePurchaseOrder({ workspaceId: team.workspaceId, orderId: id, userId: null, receivedOn: "2026-12-10" }))).code).toBe("conflict");
    expect((await failure(cancelPurchaseOrder({ workspaceId: team.workspaceId, orderId: id }))).code).toBe("conflict");
  });

  it("refuses to send to a supplier without an e-mail address, and to receive a draft", async () => {
    const order = await insertTestOrder(team.workspaceId);
    const silent = await makeSupplier(team.workspaceId);
    await db.update(purchaseOrders).set({ supplierId: silent.id }).where(eq(purchaseOrders.id, order.id));
    const err = await failure(sendPurchaseOrder({ workspaceId: team.workspaceId, orderId: order.id }));
    expect(err.message).toBe(`${silent.name} has no e-mail address. Add one on the supplier's page, then send.`);
    expect((await failure(receivePurchaseOrder({ workspaceId: team.workspaceId, orderId: order.id, userId: null, receivedOn: "2026-12-10" }))).code).toBe("conflict");
    await cancelPurchaseOrder({ workspaceId: team.workspaceId, orderId: order.id });
    expect((await getPurchaseOrder({ workspaceId: team.workspaceId, orderId: order.id })).status).toBe("cancelled");
  });
});
