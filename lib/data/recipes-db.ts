import "server-only";
import { db } from "@/db/client";
import type { DemoContext } from "@/db/demo/context";

/** The pool or an open transaction: recipe writes run inside one, the demo seed passes its own. */
export type Executor = typeof db | DemoContext["tx"];

/** Runs `work` in a transaction, or inside the caller's when one is given. */
export async function inTransaction<T>(executor: Executor | undefined, work: (tx: DemoContext["tx"]) => Promise<T>): Promise<T> {
  if (executor && executor !== db) return work(executor as DemoContext["tx"]);
  return db.transaction(work);
}
