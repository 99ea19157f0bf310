/**
 * A stand-in for the running app's /print/labels page, so the label download
 * route can print for real (Chromium, PDF and PNG) inside integration tests.
 * It serves a one-line label sheet for any path and records what Chromium asked
 * for. The browser test prints the real page.
 */
import { createServer, type IncomingMessage, type Server } from "node:http";
import type { AddressInfo } from "node:net";

export type PrintStub = { origin: string; requests: { url: string; cookie: string }[]; close: () => Promise<void> };

export async function startPrintStub(): Promise<PrintStub> {
  const requests: PrintStub["requests"] = [];
  const server: Server = createServer((req: IncomingMessage, res) => {
    requests.push({ url: req.url ?? "", cookie: req.headers.cookie ?? "" });
    res.writeHead(200, { "content-type": "text/html; charset=utf-8" });
    res.end('<!doctype html><html><body><article data-testid="label-sheet" style="width:300px;padding:20px">Stand-in label</article></body></html>');
  });
  await new Promise<void>((resolve) => server.listen(0, "127.0.0.1", resolve));
  const { port } = server.address() as AddressInfo;
  return { origin: `http://127.0.0.1:${port}`, requests, close: () => new Promise((resolve) => server.close(() => resolve())) };
}
