import "server-only";
import { eq } from "drizzle-orm";
import { db } from "@/db/client";
import { users } from "@/db/schema";

export type UserWithHash = { id: string; email: string; name: string; passwordHash: string };

export async function getUserByEmail({ email }: { email: string }): Promise<UserWithHash | null> {
  const [row] = await db
    .select({ id: users.id, email: users.email, name: users.name, passwordHash: users.passwordHash })
    .from(users)
    .where(eq(users.email, email.trim().toLowerCase()));
  return row ?? null;
}
