/**
 * From a sack of beans to a costed bar: the buyer records a lot and its
 * certificate, production takes it to nibs, and the formulator prices a
 * recipe's nibs from it on the bench. Runs after lots.test.ts (path order) in
 * the shared demo workspace; it adds one lot and changes nothing else.
 */
import { randomBytes } from "node:crypto";
import type { Page } from "playwright-core";
import { describe, expect, it } from "vitest";
import { onePagePerFile } from "./page-per-file";
import { E2E_BASE_URL } from "./config";
import { BenchPage } from "./pages/bench-page";
import { LotPage } from "./pages/lot-page";
import { signInFresh } from "./pages/sign-in-page";

let page: Page;
onePagePerFile((opened) => (page = opened));

const signInAs = (email: string) => signInFresh(page, email);

const code = `TZ-E2E-${randomBytes(2).toString("hex")}`;
// A price in the page's payload (RSC data escapes its quotes).
const pricedInPage = /pricePerKg\\*":\\*"\d/;
const pdf = Buffer.from("%PDF-1.4\n1 0 obj<</Type/Catalog/Pages 2 0 R>>endobj\n2 0 obj<</Type/Pages/Kids[]/Count 0>>endobj\ntrailer<</Root 1 0 R>>\n%%EOF\n", "latin1");

describe("nibs from a lot on the bench", () => {
  it("records a lot from arrival to nibs, with its certificate", async () => {
    // The buyer: 150 kg for EUR 1,200 plus EUR 90 freight (invented figures).
    await signInAs("priya@fenwicklane.example");
    await page.goto(`${E2E_BASE_URL}/lots/new`);
    await page.getByLabel("Lot code").fill(code);
    await page.getByLabel("Country").fill("Tanzania");
    await page.getByLabel("Farm or cooperative").fill("Mbeya Ridge Growers (invented)");
    await page.getByLabel("Arrived on").fill("2026-11-24");
    await page.getByLabel("Mass received").fill("150");
    await page.getByLabel("Price paid for the beans").fill("1200");
    await page.getByLabel("Currency").fill("EUR");
    await page.getByLabel("Freight").fill("90");
    await page.getByRole("button", { name: "Save lot" }).click();
    await page.waitForURL(/\/lots\/[0-9a-f-]{36}$/);

    const files = page.getByTestId("file-panel");
    await files.getByLabel(/^File/).setInputFiles({ name: "Organic certificate.pdf", mimeType: "application/pdf", buffer: pdf });
    await files.getByRole("button", { name: "Attach file" }).click();
    const link = files.getByRole("link", { name: "Organic certificate.pdf" });
    await link.waitFor();
    const download = await page.request.get(new URL((await link.getAttribute("href"))!, E2E_BASE_URL).toString());
    expect(download.status()).toBe(200);
    expect(download.headers()["content-type"]).toBe("application/pdf");
    // A text file named .pdf is refused, by its content, and nothing is added.
    await files.getByLabel(/^File/).setInputFiles({ name: "certificate.pdf", mimeType: "application/pdf", buffer: Buffer.from("not a pdf at all") });
    await files.getByRole("button", { name: "Attach file" }).click();
    await files.getByRole("alert").filter({ hasText: "Attach a PDF, PNG or JPEG" }).waitFor();
    expect(await files.getByRole("listitem").count()).toBe(1);

    // Production: sorting, roasting, cracking and winnowing (139.2 = 115.5 nibs + 20.1 shell + 3.6 dust).
    await signInAs("joss@fenwicklane.example");
    const lot = new LotPage(page);
    await lot.openByCode(code);
    await lot.recordStep("Sorting", { "Mass in": "150", "Beans kept": "146.5", Rejects: "3.5" });
    await lot.recordStep("Roasting", { "Mass in": "146.5", "Roasted beans": "139.2", Temperature: "128", Time: "24" });
    await lot.recordStep("Cracking and winnowing", { "Mass in": "139.2", Nibs: "115.5", Shell: "20.1", "Dust and loss": "3.6" });
    // 115.5 kg of nibs from 150 kg of beans = 77.0 %.
    await page.getByTestId("cumulative-yield").filter({ hasText: "77.0 %" }).waitFor();
  });

  // Demo prices (invented, db/demo/ingredients.ts), House dark 70 % v3 at today's preferred quotes:
  // nibs 64 % × 16.20 + cocoa butter 7.3 % × 19.80 + sugar 28.3 % × 1.131765 (985 GBP/t × 1.149)
  // + lecithin 0.3 % × 7.8132 (6.80 GBP × 1.149) + vanilla 0.1 % × 482.58 (420 GBP × 1.149)
  // = 10.368 + 1.4454 + 0.320289495 + 0.0234396 + 0.48258 = 12.639709095 EUR/kg → "12.64 EUR"; × 0.070 kg → "0.885 EUR".
  // Nibs from the lot above: (1200 + 90) / 115.5 = 11.168831168831… EUR/kg → "11.17 EUR/kg"; the nibs line costs
  // 0.64 × 11.168831168831 = 7.148051948052 instead of 10.368: 12.639709095 − 10.368 + 7.148051948052
  // = 9.419761043052 EUR/kg → "9.42 EUR"; × 0.070 kg = 0.659383273014 → "0.659 EUR".
  // Demo lot GH-2026-11 has no processing: nibs estimated at the workspace's 78 %, 300 × 0.78 = 234 kg;
  // (2280 + 210) / 234 = 10.641025641026 → "10.64 EUR/kg, estimate"; 0.64 × that = 6.810256410256;
  // 12.639709095 − 10.368 + 6.810256410256 = 9.081965505256 → "9.08 EUR".
  it("lets the formulator price the recipe's nibs from that lot, and the cost follows the choice", async () => {
    await signInAs("theo@fenwicklane.example");
    const bench = new BenchPage(page);
    await bench.openByName("House dark 70 %");
    expect(await bench.costPerKg()).toBe("12.64 EUR");
    expect(await bench.costPerBar()).toBe("0.885 EUR");

    await bench.choosePriceSource("Cocoa nibs (roasted)", `Nibs from lot ${code} (Tanzania) · 11.17 EUR/kg`);
    expect(await bench.costPerKg()).toBe("9.42 EUR");
    expect(await bench.costPerBar()).toBe("0.659 EUR");
    expect(await page.getByTestId("lot-estimate-note").count()).toBe(0);

    await bench.choosePriceSource("Cocoa nibs (roasted)", "Nibs from lot GH-2026-11 (Ghana) · 10.64 EUR/kg, estimate");
    expect(await bench.costPerKg()).toBe("9.08 EUR");
    expect(await page.getByTestId("lot-estimate-note").textContent()).toContain("lot GH-2026-11 has no winnowing recorded");

    await bench.choosePriceSource("Cocoa nibs (roasted)", "Preferred supplier's quote");
    expect(await bench.costPerKg()).toBe("12.64 EUR");
    expect(await (await page.request.get(page.url())).text()).toMatch(pricedInPage);
  });

  it("shows a viewer the bench without a cost panel, and no price in the page", async () => {
    await signInAs("wren@fenwicklane.example");
    const bench = new BenchPage(page);
    await bench.openByName("House dark 70 %");
    expect(await page.getByTestId("cost-panel").count()).toBe(0);
    expect(await (await page.request.get(page.url())).text()).not.toMatch(pricedInPage);
  });
});
