import "server-only";
import { and, eq, gt, isNull } from "drizzle-orm";
import { db } from "@/db/client";
import { passwordResets, users } from "@/db/schema";
import { conflict } from "@/lib/errors";

export async function createPasswordReset(input: { userId: string; tokenHash: string; expiresAt: Date }): Promise<void> {
  await db.insert(passwordResets).values(input);
}

/**
 * Uses a reset token once: marks it used and sets the new password hash in one
 * transaction. Throws a clear conflict for an unknown, used or expired token.
 */
export async function consumePasswordReset(input: { tokenHash: string; passwordHash: string }): Promise<{ userId: string }> {
  return db.transaction(async (tx) => {
    const [row] = await tx
      .update(passwordResets)
      .set({ usedAt: new Date() })
      .where(
        and(
          eq(passwordResets.tokenHash, input.tokenHash),
          isNull(passwordResets.usedAt),
          gt(passwordResets.expiresAt, new Date()),
        ),
      )
      .returning({ userId: passwordResets.userId });
    if (!row) throw conflict("This reset link has already been used or has expired. Ask for a new one.");
    await tx.update(users).set({ passwordHash: input.passwordHash }).where(eq(users.id, row.userId));
    return row;
  });
}
