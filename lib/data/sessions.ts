import "server-only";
import { and, eq } from "drizzle-orm";
import { db } from "@/db/client";
import { sessions } from "@/db/schema";
import { forgetSession } from "@/lib/auth/viewer-cache";

/** Makes a workspace the active one of a session (membership checked by the caller). */
export async function setActiveWorkspace({
  sessionId,
  userId,
  workspaceId,
}: {
  sessionId: string;
  userId: string;
  workspaceId: string;
}): Promise<void> {
  await db
    .update(sessions)
    .set({ activeWorkspaceId: workspaceId })
    .where(and(eq(sessions.id, sessionId), eq(sessions.userId, userId)));
  forgetSession(sessionId);
}

export async function countSessionsOf({ userId }: { userId: string }): Promise<number> {
  return (await db.select({ id: sessions.id }).from(sessions).where(eq(sessions.userId, userId))).length;
}
