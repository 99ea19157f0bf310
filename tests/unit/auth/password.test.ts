import { describe, expect, it } from "vitest";
import { hashPassword, verifyPassword } from "@/lib/auth/password";

describe("hashPassword", () => {
  it("uses argon2id with at least the OWASP minimum: 19 MiB, 2 iterations, parallelism 1", async () => {
    // OWASP Password Storage Cheat Sheet, Argon2id: m=19456 (19 MiB), t=2, p=1.
    const h = await hashPassword("cocoa butter");
    expect(h).toMatch(/^\$argon2id\$v=19\$m=19456,t=2,p=1\$/);
  });

  it("verifies the right password and rejects a wrong one or a malformed hash", async () => {
    const h = await hashPassword("cocoa butter");
    expect(await verifyPassword(h, "cocoa butter")).toBe(true);
    expect(await verifyPassword(h, "cocoa powder")).toBe(false);
    expect(await verifyPassword("not-a-hash", "cocoa butter")).toBe(false);
  });
});
