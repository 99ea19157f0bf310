import { randomBytes } from "node:crypto";
import { db } from "@/db/client";
import { beanLots } from "@/db/schema";

/** A plain lot of 100 kg at 500 EUR in a workspace (invented test data). */
export async function createTestLot(workspaceId: string, overrides: Partial<typeof beanLots.$inferInsert> = {}) {
  const [lot] = await db
    .insert(beanLots)
    .values({
      workspaceId,
      code: `T-${randomBytes(3).toString("hex")}`,
      originCountry: "Peru",
      arrivedOn: "2026-10-01",
      massReceivedKg: "100",
      pricePaid: "500",
      currency: "EUR",
      ...overrides,
    })
    .returning({ id: beanLots.id, code: beanLots.code });
  return lot!;
}

export const newKey = () => randomBytes(8).toString("hex");
