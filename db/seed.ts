/**
 * The demo workspace: Fenwick Lane Chocolate Works, an invented bean-to-bar maker
 * in the invented town of Ashcombe Quay. Every name here is invented. Running the
 * seed twice changes nothing: rows are matched on their natural keys.
 */
import { and, eq } from "drizzle-orm";
import type { NodePgDatabase } from "drizzle-orm/node-postgres";
import { hashPassword } from "../lib/auth/password";
import { seedBatches } from "./demo/batches";
import type { DemoSeeder } from "./demo/context";
import { seedIngredients } from "./demo/ingredients";
import { seedRecipes } from "./demo/recipes";
import { seedLabels } from "./demo/labels";
import { seedLots } from "./demo/lots";
import { seedLotFiles } from "./demo/lot-files";
import { seedCosting } from "./demo/costing";
import * as schema from "./schema";
import { memberships, users, workspaces, type Role } from "./schema";

export const DEMO_PASSWORD = "ashcombe-quay-demo";
export const DEMO_WORKSPACE = { name: "Fenwick Lane Chocolate Works", slug: "fenwick-lane", baseCurrency: "EUR" };

export const DEMO_PEOPLE: ReadonlyArray<{ name: string; email: string; role: Role }> = [
  { name: "Mara Ellison", email: "mara@fenwicklane.example", role: "owner" },
  { name: "Theo Brandt", email: "theo@fenwicklane.example", role: "formulator" },
  { name: "Priya Castellano", email: "priya@fenwicklane.example", role: "buyer" },
  { name: "Joss Okafor", email: "joss@fenwicklane.example", role: "production" },
  { name: "Wren Halloway", email: "wren@fenwicklane.example", role: "viewer" },
];

type Database = NodePgDatabase<typeof schema>;

/**
 * Each feature's demo data, in dependency order (ingredients before recipes…).
 * Every seeder is idempotent.
 */
const featureSeeders: DemoSeeder[] = [seedIngredients, seedRecipes, seedLabels, seedLots, seedLotFiles, seedBatches, seedCosting];

export async function seedDemo(db: Database): Promise<{ workspaceId: string }> {
  return db.transaction(async (tx) => {
    await tx.insert(workspaces).values(DEMO_WORKSPACE).onConflictDoNothing({ target: workspaces.slug });
    const [workspace] = await tx.select().from(workspaces).where(eq(workspaces.slug, DEMO_WORKSPACE.slug));
    if (!workspace) throw new Error("seed: demo workspace missing after insert");

    // One hash per run (argon2 is deliberately slow); people already present keep theirs.
    const passwordHash = await hashPassword(DEMO_PASSWORD);
    const people = {} as Record<Role, string>;
    for (const person of DEMO_PEOPLE) {
      await tx
        .insert(users)
        .values({ name: person.name, email: person.email, passwordHash })
        .onConflictDoNothing({ target: users.email });
      const [user] = await tx.select().from(users).where(eq(users.email, person.email));
      if (!user) throw new Error(`seed: user ${person.email} missing after insert`);
      const existing = await tx
        .select()
        .from(memberships)
        .where(and(eq(memberships.workspaceId, workspace.id), eq(memberships.userId, user.id)));
      if (existing.length === 0) {
        await tx.insert(memberships).values({ workspaceId: workspace.id, userId: user.id, role: person.role });
      }
      people[person.role] = user.id;
    }
    for (const seed of featureSeeders) await seed({ tx, workspaceId: workspace.id, people });
    return { workspaceId: workspace.id };
  });
}
