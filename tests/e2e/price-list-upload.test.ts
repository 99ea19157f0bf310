import type { BrowserContext, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { DEMO_PEOPLE } from "@/db/seed";
import { launchBrowser } from "./browser";
import { E2E_BASE_URL } from "./config";
import { PriceListPage } from "./pages/price-list-page";
import { SignInPage } from "./pages/sign-in-page";

let context: BrowserContext;
let page: Page;

beforeAll(async () => {
  context = await launchBrowser();
  page = context.pages()[0] ?? (await context.newPage());
  const signIn = new SignInPage(page);
  await signIn.open();
  await signIn.signIn(DEMO_PEOPLE.find((p) => p.role === "buyer")!.email);
  await page.waitForURL(`${E2E_BASE_URL}/overview`);
});
afterAll(async () => {
  await context?.close();
});

// Invented demo prices for the seeded ingredients; one row names an ingredient the library does not have.
const PRICE_LIST = [
  "Product,Price,Currency,Unit,Valid from",
  "Sugar (sucrose),1010,GBP,per tonne,2026-11-15",
  "Soy lecithin,7.10,GBP,kg,2026-11-15",
  "Edible glitter,3,GBP,kg,2026-11-15",
].join("\n");

describe("uploading a price list through the page", () => {
  it("previews every row, imports the valid ones, and shows the new quotes without a reload", async () => {
    const upload = new PriceListPage(page);
    await upload.open();
    await upload.chooseSupplier(/^Saltmarsh Sugar Company/);
    await upload.chooseFile("saltmarsh-november.csv", PRICE_LIST);
    await upload.read();

    expect(await upload.counts()).toMatch(/2 new quotes to import · 0 already recorded · 0 repeated in the file · 1 refused/);
    expect(await upload.row(4).textContent()).toMatch(/refused.*no ingredient called “Edible glitter” in your library/);
    // Compared with the supplier's current price (985 GBP/t at the October rate → 1010 GBP/t).
    expect(await upload.row(2).textContent()).toMatch(/will import.*Sugar \(sucrose\)/);

    await upload.importRows();
    expect(await upload.outcome()).toMatch(/Imported 2 quotes from Saltmarsh Sugar Company\. 0 already recorded, 1 refused\./);
    await upload.quoteRow("Sugar (sucrose)", "2026-11-15").waitFor();
    expect(await upload.quoteRow("Sugar (sucrose)", "2026-11-15").textContent()).toMatch(/GBP 1,010\.00 per tonne.*current.*price-list upload/);
    expect(await upload.quoteRow("Soy lecithin", "2026-11-15").textContent()).toMatch(/GBP 7\.10 per kg/);
  });

  it("recognises the same file uploaded again and adds nothing", async () => {
    const upload = new PriceListPage(page);
    await upload.open();
    await upload.chooseSupplier(/^Saltmarsh Sugar Company/);
    await upload.chooseFile("saltmarsh-november.csv", PRICE_LIST);
    await upload.read();
    expect(await upload.counts()).toMatch(/0 new quotes to import · 2 already recorded/);
    expect(await page.getByText(/This same file was imported on/).count()).toBe(1);
    expect(await page.getByRole("button", { name: "Import 0 new quotes" }).isDisabled()).toBe(true);
  });

  it("refuses a file that is not CSV with a clear message", async () => {
    const upload = new PriceListPage(page);
    await upload.open();
    await upload.chooseSupplier(/^Saltmarsh Sugar Company/);
    await page.getByLabel("Price list (CSV)").setInputFiles({ name: "prices.csv", mimeType: "text/csv", buffer: Buffer.from("%PDF-1.7\n1 0 obj\n<<>>\nendobj\n") });
    await page.getByRole("button", { name: "Read the file" }).click();
    await page.getByTestId("price-list-error").waitFor();
    expect(await page.getByTestId("price-list-error").textContent()).toMatch(/That is a PDF file, not a CSV file/);
  });
});
