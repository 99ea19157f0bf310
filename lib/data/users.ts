import "server-only";
import { eq } from "drizzle-orm";
import { db } from "@/db/client";
import { users } from "@/db/schema";

export type UserWithHash = { id: string; email: string; name: string; passwordHash: string };

const columns = { id: users.id, email: users.email, name: users.name, passwordHash: users.passwordHash };

export async function getUserByEmail({ email }: { email: string }): Promise<UserWithHash | null> {
  const [row] = await db.select(columns).from(users).where(eq(users.email, email.trim().toLowerCase()));
  return row ?? null;
}

export async function getUserById({ userId }: { userId: string }): Promise<UserWithHash | null> {
  const [row] = await db.select(columns).from(users).where(eq(users.id, userId));
  return row ?? null;
}

export async function setPasswordHash({ userId, passwordHash }: { userId: string; passwordHash: string }): Promise<void> {
  await db.update(users).set({ passwordHash }).where(eq(users.id, userId));
}
