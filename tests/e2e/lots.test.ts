import { randomBytes } from "node:crypto";
import type { Page } from "playwright-core";
import { describe, expect, it } from "vitest";
import { onePagePerFile } from "./page-per-file";
import { E2E_BASE_URL } from "./config";
import { LotPage } from "./pages/lot-page";
import { signInFresh } from "./pages/sign-in-page";

let page: Page;
onePagePerFile((opened) => (page = opened));

const signInAs = (email: string) => signInFresh(page, email);

describe("a lot from arrival to nibs", () => {
  it("is recorded by the buyer, processed by production, and costs its nibs from the real yield", async () => {
    const code = `PE-E2E-${randomBytes(2).toString("hex")}`;

    // The buyer records the arrival: 200 kg for EUR 1,800 plus EUR 150 freight.
    await signInAs("priya@fenwicklane.example");
    await page.goto(`${E2E_BASE_URL}/lots/new`);
    await page.getByLabel("Lot code").fill(code);
    await page.getByLabel("Country").fill("Peru");
    await page.getByLabel("Farm or cooperative").fill("Alto Sendero Growers (invented)");
    await page.getByLabel("Arrived on").fill("2026-11-20");
    await page.getByLabel("Mass received").fill("200");
    await page.getByLabel("Price paid for the beans").fill("1800");
    await page.getByLabel("Currency").fill("EUR");
    await page.getByLabel("Freight").fill("150");
    await page.getByRole("button", { name: "Save lot" }).click();
    await page.waitForURL(/\/lots\/[0-9a-f-]{36}$/);
    // Before processing, nibs are estimated at the workspace's 78 %: 156 kg; (1800 + 150) / 156 = 12.50 EUR/kg.
    const lot = new LotPage(page);
    expect(await lot.nibCost()).toBe("EUR 12.50 per kg");
    // The buyer cannot record processing.
    expect(await page.getByRole("form", { name: "Record a processing step" }).count()).toBe(0);

    // Production records sorting, roasting and winnowing.
    await signInAs("joss@fenwicklane.example");
    await lot.openByCode(code);
    await lot.recordStep("Sorting", { "Mass in": "200", "Beans kept": "195", Rejects: "5" });
    await lot.recordStep("Roasting", { "Mass in": "195", "Roasted beans": "185.25", Temperature: "132", Time: "20" });
    await lot.recordStep("Cracking and winnowing", { "Mass in": "185.25", Nibs: "152", Shell: "26", "Dust and loss": "7.25" });

    // 152 kg of nibs from 200 kg of beans = 76.0 %.
    await page.getByTestId("cumulative-yield").filter({ hasText: "76.0 %" }).waitFor();
    expect(await page.getByTestId("processing-records").getByRole("row").count()).toBe(4);
    // Production sees masses and yields but no money while the owner has not shared costs.
    expect(await page.getByTestId("nib-cost").count()).toBe(0);
    expect(await lot.moneyShown()).toEqual([]);

    // A step whose mass out exceeds its mass in is refused with a message, and nothing is added.
    const form = page.getByRole("form", { name: "Record a processing step" });
    await form.getByRole("combobox", { name: "Step" }).click();
    await page.getByRole("option", { name: "Sorting", exact: true }).click();
    await form.getByLabel("Mass in", { exact: true }).fill("10");
    await form.getByLabel("Beans kept", { exact: true }).fill("12");
    await form.getByRole("button", { name: "Record step" }).click();
    expect(await form.getByTestId("form-error").textContent()).toBe("Mass out (12 kg) is more than mass in (10 kg).");
    expect(await page.getByTestId("processing-records").getByRole("row").count()).toBe(4);

    // The buyer sees the nib cost from the record: (1800 + 150) / 152 = 12.8289… → EUR 12.83 per kg.
    await signInAs("priya@fenwicklane.example");
    await lot.openByCode(code);
    expect(await page.getByText("estimate: winnowing not recorded").count()).toBe(0);
    expect(await lot.nibCost()).toBe("EUR 12.83 per kg");
  });
});
