import "server-only";
import { eq } from "drizzle-orm";
import { db } from "@/db/client";
import { workspaces } from "@/db/schema";
import { notFound } from "@/lib/errors";

/** Whether the owner lets production and viewers see costs (the workspace setting, off by default). */
export async function getShowCostsToAll({ workspaceId }: { workspaceId: string }): Promise<boolean> {
  const [row] = await db.select({ show: workspaces.showCostsToAll }).from(workspaces).where(eq(workspaces.id, workspaceId));
  if (!row) throw notFound("That workspace");
  return row.show;
}

export async function setShowCostsToAll({ workspaceId, show }: { workspaceId: string; show: boolean }): Promise<void> {
  await db.update(workspaces).set({ showCostsToAll: show }).where(eq(workspaces.id, workspaceId));
}
