import { createHash, randomBytes } from "node:crypto";

/** A random token for a cookie or an e-mailed link: 160 bits from the OS CSPRNG, base64url. */
export function generateToken(): string {
  return randomBytes(20).toString("base64url");
}

/** What the database stores instead of a token: hex SHA-256, so a leaked table holds no usable token. */
export function hashToken(token: string): string {
  return createHash("sha256").update(token).digest("hex");
}
