import "server-only";
import { randomBytes } from "node:crypto";
import { eq } from "drizzle-orm";
import { db } from "@/db/client";
import { memberships, users, workspaces } from "@/db/schema";
import { addReferenceIngredients } from "./ingredients";

/** A URL-safe slug from a business name, with a random suffix so it is unique. */
export function slugFor(name: string): string {
  const base = name
    .normalize("NFKD")
    .replace(/[\u0300-\u036f]/g, "")
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, "-")
    .replace(/^-|-$/g, "")
    .slice(0, 40);
  return `${base || "workspace"}-${randomBytes(3).toString("hex")}`;
}

/**
 * Sign-up: a new user, their new workspace (its ingredient library started from
 * the reference profiles), and their owner membership, in one transaction.
 */
export async function createAccountWithWorkspace(input: {
  name: string;
  email: string;
  passwordHash: string;
  workspaceName: string;
}): Promise<{ userId: string; workspaceId: string }> {
  return db.transaction(async (tx) => {
    const [user] = await tx
      .insert(users)
      .values({ name: input.name, email: input.email, passwordHash: input.passwordHash })
      .returning({ id: users.id });
    const [workspace] = await tx
      .insert(workspaces)
      .values({ name: input.workspaceName, slug: slugFor(input.workspaceName) })
      .returning({ id: workspaces.id });
    if (!user || !workspace) throw new Error("insert returned no row");
    await tx.insert(memberships).values({ userId: user.id, workspaceId: workspace.id, role: "owner" });
    await addReferenceIngredients({ tx, workspaceId: workspace.id });
    return { userId: user.id, workspaceId: workspace.id };
  });
}

/** The workspace's base currency (ISO 4217), in which every cost is shown. */
export async function getWorkspaceBaseCurrency({ workspaceId }: { workspaceId: string }): Promise<string> {
  const [row] = await db.select({ base: workspaces.baseCurrency }).from(workspaces).where(eq(workspaces.id, workspaceId));
  return row?.base ?? "EUR";
}
