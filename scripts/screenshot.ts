/**
 * Developer aid: screenshots pages of a running Barwright in Debian's chromium.
 *   npx tsx scripts/screenshot.ts [--as email] [--base http://127.0.0.1:3000] /path1 /path2 …
 * PNGs go to .data/screenshots/. Password: the demo one.
 */
import { mkdirSync, mkdtempSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { chromium } from "playwright-core";
import { DEMO_PASSWORD } from "../db/seed";
import { CHROMIUM_ARGS, CHROMIUM_PATH } from "../tests/e2e/browser";

async function main() {
  const args = process.argv.slice(2);
  let base = "http://127.0.0.1:3000";
  let as: string | null = null;
  let width = 1280;
  const paths: string[] = [];
  for (let i = 0; i < args.length; i++) {
    const a = args[i]!;
    if (a === "--as") as = args[++i] ?? null;
    else if (a === "--base") base = args[++i] ?? base;
    else if (a === "--width") width = Number(args[++i] ?? width);
    else paths.push(a);
  }
  const outDir = path.resolve(".data/screenshots");
  mkdirSync(outDir, { recursive: true });
  const context = await chromium.launchPersistentContext(mkdtempSync(path.join(tmpdir(), "bw-shot-")), {
    executablePath: CHROMIUM_PATH,
    args: CHROMIUM_ARGS,
    viewport: { width, height: 900 },
  });
  const page = context.pages()[0] ?? (await context.newPage());
  if (as) {
    await page.goto(`${base}/sign-in`);
    await page.getByLabel("E-mail").fill(as);
    await page.getByLabel("Password").fill(DEMO_PASSWORD);
    await page.getByRole("button", { name: "Sign in" }).click();
    await page.waitForURL((u) => !u.pathname.startsWith("/sign-in"), { timeout: 15_000 });
  }
  for (const p of paths.length ? paths : ["/"]) {
    await page.goto(`${base}${p}`);
    await page.waitForLoadState("networkidle");
    const file = path.join(outDir, `${p.replace(/[^a-z0-9]+/gi, "_").replace(/^_|_$/g, "") || "home"}.png`);
    await page.screenshot({ path: file, fullPage: true });
    console.log(file);
  }
  await context.close();
}

main().catch((err: unknown) => {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
});
