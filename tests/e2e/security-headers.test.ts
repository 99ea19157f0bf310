import type { BrowserContext } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { launchBrowser } from "./browser";
import { E2E_BASE_URL } from "./config";
import { SignInPage } from "./pages/sign-in-page";

describe("security headers of the production server", () => {
  it("sends a nonce-based Content-Security-Policy on pages, a fresh nonce each time", async () => {
    const a = await fetch(`${E2E_BASE_URL}/sign-in`);
    const b = await fetch(`${E2E_BASE_URL}/sign-in`);
    const csp = a.headers.get("content-security-policy") ?? "";
    expect(csp).toMatch(/script-src 'self' 'nonce-[A-Za-z0-9+/=]+' 'strict-dynamic'/);
    expect(csp).toContain("frame-ancestors 'none'");
    expect(csp).toContain("object-src 'none'");
    // WebAssembly may compile (the least-cost solver); JavaScript eval may not.
    expect(csp).toMatch(/script-src [^;]*'wasm-unsafe-eval'/);
    expect(csp).not.toContain("'unsafe-eval'");
    const nonceOf = (h: string | null) => h?.match(/'nonce-([^']+)'/)?.[1];
    expect(nonceOf(b.headers.get("content-security-policy"))).not.toBe(nonceOf(csp));
    // The page's own scripts carry that nonce.
    const html = await a.text();
    expect(html).toContain(`nonce="${nonceOf(csp)}"`);
  });

  it.each(["/", "/sign-in", "/api/health"])("sends the fixed hardening headers on %s", async (path) => {
    const res = await fetch(`${E2E_BASE_URL}${path}`);
    expect(res.headers.get("x-content-type-options")).toBe("nosniff");
    expect(res.headers.get("referrer-policy")).toBe("strict-origin-when-cross-origin");
    expect(res.headers.get("x-frame-options")).toBe("DENY");
    expect(res.headers.get("permissions-policy")).toContain("camera=()");
    expect(res.headers.get("x-powered-by")).toBeNull();
  });
});

describe("pages under the policy", () => {
  let context: BrowserContext;
  beforeAll(async () => {
    context = await launchBrowser();
  });
  afterAll(async () => {
    await context?.close();
  });

  it("hydrate and work with no policy violation", async () => {
    const page = context.pages()[0] ?? (await context.newPage());
    const violations: string[] = [];
    page.on("console", (m) => {
      if (/Content Security Policy|Refused to/i.test(m.text())) violations.push(m.text());
    });
    const signIn = new SignInPage(page);
    await signIn.open();
    await signIn.signIn("theo@fenwicklane.example");
    await page.waitForURL(`${E2E_BASE_URL}/overview`);
    // A client-side interaction only works when React hydrated.
    await page.getByRole("button", { name: /Account menu/ }).click();
    expect(await page.getByRole("menuitem", { name: "Sign out" }).count()).toBe(1);
    // The least-cost solver is WebAssembly: the policy lets a page compile it (the smallest valid module).
    const compiled = await page.evaluate(() =>
      WebAssembly.compile(new Uint8Array([0x00, 0x61, 0x73, 0x6d, 0x01, 0x00, 0x00, 0x00])).then(
        () => "compiled",
        (error: unknown) => String(error),
      ),
    );
    expect(compiled).toBe("compiled");
    expect(violations).toEqual([]);
  });
});
