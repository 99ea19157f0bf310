import "server-only";
import { readdir, readFile } from "node:fs/promises";
import path from "node:path";

export type CapturedMail = { id: string; receivedAt: string; from: string; to: string; subject: string; text: string };

/**
 * The demo mailbox: messages the local SMTP sink captured. Only on when
 * BARWRIGHT_DEMO_MAILBOX=1 (the start command and tests set it); never in a
 * real deployment, where mail goes to real inboxes.
 */
export function mailboxEnabled(): boolean {
  return process.env.BARWRIGHT_DEMO_MAILBOX === "1";
}

export async function listCapturedMail({ limit = 50 }: { limit?: number } = {}): Promise<CapturedMail[]> {
  if (!mailboxEnabled()) return [];
  const dir = path.resolve(process.env.BARWRIGHT_MAILBOX_DIR ?? ".data/mailbox");
  let files: string[];
  try {
    files = (await readdir(dir)).filter((f) => f.endsWith(".json"));
  } catch {
    return [];
  }
  const mails = await Promise.all(
    files.map(async (f) => JSON.parse(await readFile(path.join(dir, f), "utf8")) as CapturedMail),
  );
  return mails.sort((a, b) => b.receivedAt.localeCompare(a.receivedAt) || b.id.localeCompare(a.id)).slice(0, limit);
}
