/**
 * A local SMTP sink for development, the demo and tests: accepts every message
 * on 127.0.0.1 (plain SMTP, optional auth) and stores each as JSON in the
 * mailbox folder, where the owner-only demo mailbox page reads it. Attachments
 * are recorded by file name, type and size only (their content is not kept).
 *   BARWRIGHT_SMTP_PORT (default 2525), BARWRIGHT_MAILBOX_DIR (default .data/mailbox)
 */
import { mkdirSync, writeFileSync } from "node:fs";
import path from "node:path";
import { simpleParser } from "mailparser";
import { SMTPServer } from "smtp-server";

export function startMailSink(opts: { port: number; dir: string }): Promise<SMTPServer> {
  mkdirSync(opts.dir, { recursive: true });
  let seq = 0;
  const server = new SMTPServer({
    secure: false,
    disabledCommands: ["STARTTLS"],
    authOptional: true,
    logger: false,
    size: 1024 * 1024,
    onData(stream, _session, callback) {
      simpleParser(stream)
        .then((mail) => {
          const id = `${Date.now()}-${process.pid}-${++seq}`;
          const to = Array.isArray(mail.to) ? mail.to.map((a) => a.text).join(", ") : (mail.to?.text ?? "");
          const record = {
            id,
            receivedAt: new Date().toISOString(),
            from: mail.from?.text ?? "",
            to,
            subject: mail.subject ?? "",
            text: mail.text ?? "",
            attachments: mail.attachments.map((a) => ({ filename: a.filename ?? "", contentType: a.contentType, size: a.size })),
          };
          writeFileSync(path.join(opts.dir, `${id}.json`), JSON.stringify(record, null, 2));
          callback();
        })
        .catch((err: Error) => callback(err));
    },
  });
  return new Promise((resolve, reject) => {
    server.once("error", reject);
    server.listen(opts.port, "127.0.0.1", () => resolve(server));
  });
}

const isMain = process.argv[1] && path.resolve(process.argv[1]).endsWith(path.join("scripts", "mail-sink.ts"));
if (isMain) {
  const port = Number(process.env.BARWRIGHT_SMTP_PORT ?? 2525);
  const dir = path.resolve(process.env.BARWRIGHT_MAILBOX_DIR ?? ".data/mailbox");
  startMailSink({ port, dir })
    .then(() => console.log(`mail-sink: SMTP on 127.0.0.1:${port}, messages in ${dir}`))
    .catch((err: NodeJS.ErrnoException) => {
      console.error(
        err.code === "EADDRINUSE"
          ? `mail-sink: port ${port} on 127.0.0.1 is already in use. Stop that program or set BARWRIGHT_SMTP_PORT.`
          : `mail-sink: could not start: ${err.message}`,
      );
      process.exit(1);
    });
}
