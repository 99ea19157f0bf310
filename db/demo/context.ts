import type { NodePgDatabase } from "drizzle-orm/node-postgres";
import type { Role } from "../schema";
import type * as schema from "../schema";

/** What each feature's demo seed receives: the transaction, the demo workspace and its people by role. */
export type DemoContext = {
  tx: Parameters<Parameters<NodePgDatabase<typeof schema>["transaction"]>[0]>[0];
  workspaceId: string;
  people: Record<Role, string>;
};

/**
 * A feature's part of the demo seed. It must be idempotent: match existing rows
 * on natural keys (names, codes) and insert only what is missing.
 */
export type DemoSeeder = (ctx: DemoContext) => Promise<void>;
