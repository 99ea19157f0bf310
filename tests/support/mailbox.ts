import { readdirSync, readFileSync } from "node:fs";
import path from "node:path";

type Mail = { id: string; receivedAt: string; to: string; subject: string; text: string };

/** The newest captured message to an address, from the SMTP sink's folder. */
export function latestMailTo(dir: string, address: string): Mail | null {
  let files: string[] = [];
  try {
    files = readdirSync(dir).filter((f) => f.endsWith(".json"));
  } catch {
    return null;
  }
  const mails = files
    .map((f) => JSON.parse(readFileSync(path.join(dir, f), "utf8")) as Mail)
    .filter((m) => m.to.toLowerCase().includes(address.toLowerCase()))
    .sort((a, b) => a.id.localeCompare(b.id, undefined, { numeric: true }));
  return mails.at(-1) ?? null;
}

/** The token at the end of the first Barwright link of a given kind in a message. */
export function tokenFromMail(mail: Mail, kind: "invitations" | "reset-password"): string {
  const m = mail.text.match(new RegExp(`/${kind}/([A-Za-z0-9_-]+)`));
  if (!m?.[1]) throw new Error(`no ${kind} link in: ${mail.text}`);
  return m[1];
}
