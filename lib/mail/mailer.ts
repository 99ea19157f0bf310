import "server-only";
import nodemailer from "nodemailer";

/**
 * Outgoing mail over SMTP with nodemailer. BARWRIGHT_SMTP_URL points at the
 * real relay in production; locally and in tests it is our sink on loopback
 * (scripts/mail-sink.ts), which keeps every message for the demo mailbox.
 */
const smtpUrl = process.env.BARWRIGHT_SMTP_URL ?? "smtp://127.0.0.1:2525";
const from = process.env.BARWRIGHT_MAIL_FROM ?? "Barwright <no-reply@barwright.example>";

const url = new URL(smtpUrl);
const loopback = ["127.0.0.1", "localhost", "[::1]"].includes(url.hostname);

const transport = nodemailer.createTransport({
  host: url.hostname,
  port: Number(url.port || (url.protocol === "smtps:" ? 465 : 587)),
  secure: url.protocol === "smtps:",
  // The local sink speaks plain SMTP on loopback; a real relay uses TLS.
  ignoreTLS: loopback,
  auth: url.username ? { user: decodeURIComponent(url.username), pass: decodeURIComponent(url.password) } : undefined,
  connectionTimeout: 5_000,
  greetingTimeout: 5_000,
  socketTimeout: 10_000,
});

/** A file sent with a message (a purchase order's CSV…). */
export type MailAttachment = { filename: string; content: string | Buffer; contentType: string };

export async function sendMail(message: { to: string; subject: string; text: string; html?: string; attachments?: MailAttachment[] }): Promise<void> {
  await transport.sendMail({ from, ...message });
}
