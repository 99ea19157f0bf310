import type { BrowserContext, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { launchBrowser } from "./browser";
import { E2E_BASE_URL } from "./config";
import { BatchPage, PlanBatchPage } from "./pages/batch-pages";
import { SignInPage } from "./pages/sign-in-page";
import { readPdf } from "./support/pdf-text";

let context: BrowserContext;
let page: Page;

beforeAll(async () => {
  context = await launchBrowser();
  page = context.pages()[0] ?? (await context.newPage());
});
afterAll(async () => {
  await context?.close();
});

// The demo's released "House dark 70 %" v2: nibs 64, cocoa butter 7.3, sugar 28.4, lecithin 0.3 (db/demo/recipes.ts).
const INGREDIENTS = ["Cocoa nibs (roasted)", "Cocoa butter", "Sugar (sucrose)", "Soy lecithin"];

describe("a batch from plan to run", () => {
  it("is planned by production, printed to PDF with every ingredient and the total, recorded, and recalled from its lot", async () => {
    await new SignInPage(page).open();
    await new SignInPage(page).signIn("joss@fenwicklane.example");
    await page.waitForURL(`${E2E_BASE_URL}/overview`);

    // Plan 25 kg on a 10 kg stone refiner, weighed on the 1 g bench scale.
    const plan = new PlanBatchPage(page);
    await plan.open();
    await plan.fill({ recipe: /^House dark 70 %/, amount: "25", unit: /^kg$/, machine: /^Stone refiner B/, station: /^Bench scale/ });
    await page.getByText("in 3 loads of 8.334 kg or 8.333 kg").waitFor(); // 25,000 g ÷ 3 = 8,333 r 1
    expect(await plan.previewTotal()).toBe("25.000 kg");
    await plan.submit();
    const batch = new BatchPage(page);
    const code = (await batch.code())!;
    expect(code).toMatch(/^B-\d{4}-\d{4}$/);
    const batchUrl = page.url();
    const batchId = batchUrl.split("/").pop()!;

    // The printable sheet: every ingredient, the total, a page per load, the code and the caution.
    const sheet = await context.newPage();
    await sheet.goto(`${E2E_BASE_URL}/print/batches/${batchId}`);
    expect(await sheet.getByTestId("sheet-code").first().textContent()).toBe(code);
    expect(await sheet.getByTestId("sheet-total").textContent()).toBe("25.000 kg");
    expect(await sheet.getByTestId("sheet-load").count()).toBe(3);
    const totals = (await sheet.getByTestId("sheet-totals").textContent())!;
    for (const name of INGREDIENTS) expect(totals).toContain(name);
    expect(totals).toContain("16.000 kg"); // 64 % of 25 kg
    expect(await sheet.getByTestId("sheet-allergens").textContent()).toBe("Contains: Soybeans.");
    await sheet.getByText("must follow your own validated process").waitFor();
    expect(await sheet.locator("nav").count()).toBe(0); // no app chrome on paper

    // The same page printed by the browser, and the server's PDF on US Letter.
    await sheet.emulateMedia({ media: "print" });
    const printed = await sheet.pdf({ format: "A4" });
    await sheet.close();
    const response = await context.request.get(`${E2E_BASE_URL}/api/batches/${batchId}/pdf?paper=letter`, { timeout: 60_000 });
    expect(response.status()).toBe(200);
    expect(response.headers()["content-type"]).toBe("application/pdf");
    const served = await response.body();
    for (const [pdf, size] of [
      [printed, /A4/],
      [served, /letter/],
    ] as const) {
      expect(pdf.subarray(0, 5).toString()).toBe("%PDF-");
      const read = readPdf(pdf);
      if (!read) {
        console.warn("pdftotext is not installed: the PDF's text was not checked (the sheet's DOM was).");
        continue;
      }
      expect(read.pageSize).toMatch(size);
      expect(read.pages).toBeGreaterThanOrEqual(4); // the batch page(s) and one page per load
      for (const name of INGREDIENTS) expect(read.text).toContain(name);
      expect(read.text).toContain("25.000 kg");
      expect(read.text).toContain(code);
      expect(read.text).toMatch(/LOAD 3 OF 3 — 8\.333 KG/);
    }

    // Record the run: sugar 2.8 % over plan is flagged at a 2 % tolerance.
    await page.goto(batchUrl);
    await batch.recordRun(
      {
        "Cocoa nibs (roasted)": { actual: "16", lot: "EC-2026-07" },
        "Cocoa butter": { actual: "1.825", lot: "BWB-2611-03" },
        "Sugar (sucrose)": { actual: "7.3", lot: "SSC-26-1107" },
        "Soy lecithin": { actual: "75" },
      },
      { started: "2026-12-02T08:00", ended: "2026-12-03T16:30", tolerance: "2" },
    );
    expect(await batch.flaggedRows().count()).toBe(1);
    expect(await batch.flaggedRows().first().textContent()).toContain("Sugar (sucrose)");
    await page.getByText("completed", { exact: true }).waitFor();

    // The recall question in one click: the lot's page lists this batch, and its nibs went down by 16 kg.
    await page.getByTestId("run-record").getByRole("link", { name: "EC-2026-07" }).click();
    await page.waitForURL(/\/lots\/[0-9a-f-]{36}$/);
    const recall = page.getByTestId("lot-batches");
    await recall.getByRole("link", { name: code }).waitFor();
    // 195.3 kg from winnowing − 12.8 kg (the demo's completed run) − 16 kg (this run) = 166.5 kg.
    expect(await page.getByTestId("lot-nibs-in-stock").textContent()).toBe("166.5 kg");
  }, 180_000); // the server starts its own Chromium to print the PDF

  it("refuses a run whose nibs name no bean lot, and keeps what was typed", async () => {
    await page.goto(`${E2E_BASE_URL}/batches`);
    await page.getByRole("link", { name: "B-2026-0002" }).click();
    const form = page.getByRole("form", { name: "Record the run" });
    // The demo's planned 40 kg of Harbour milk 45 %, weighed as planned, but the nibs' lot code is not a lot of ours.
    const actuals: Record<string, string> = { "Cocoa nibs (roasted)": "12.8", "Cocoa butter": "5.48", "Sugar (sucrose)": "12.76", "Whole milk powder": "8.8", "Soy lecithin": "160" };
    for (const [name, value] of Object.entries(actuals)) await form.getByLabel(`Actual ${name}`, { exact: true }).fill(value);
    await form.getByLabel("Lot code Cocoa nibs (roasted)", { exact: true }).fill("XX-0000");
    await form.getByLabel("Started").fill("2026-12-08T08:00");
    await form.getByLabel("Ended").fill("2026-12-09T12:00");
    await form.getByRole("button", { name: "Complete the run" }).click();
    await form.getByText("XX-0000 is not one of your bean lots.").waitFor();
    expect(await form.getByLabel("Actual Cocoa nibs (roasted)", { exact: true }).inputValue()).toBe("12.8");
    expect(await page.getByTestId("run-record").count()).toBe(0); // nothing was recorded
  });
});
