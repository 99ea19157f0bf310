import type { Page } from "playwright-core";
import { E2E_BASE_URL } from "../config";
import { moneyIn } from "./money";

/** A bean lot's page: the chain, the nib cost and the record forms. */
export class LotPage {
  constructor(private readonly page: Page) {}

  async openByCode(code: string) {
    await this.page.goto(`${E2E_BASE_URL}/lots`);
    await this.page.getByRole("link", { name: code, exact: true }).click();
    await this.page.waitForURL(/\/lots\/[0-9a-f-]{36}$/);
  }

  /** Records a step through the form; `fields` maps a field label to its value. */
  async recordStep(step: "Sorting" | "Roasting" | "Cracking and winnowing", fields: Record<string, string>) {
    const form = this.page.getByRole("form", { name: "Record a processing step" });
    await form.getByRole("combobox", { name: "Step" }).click();
    await this.page.getByRole("option", { name: step, exact: true }).click();
    for (const [label, value] of Object.entries(fields)) await form.getByLabel(label, { exact: true }).fill(value);
    // Wait for the new row itself: a success message may still be on screen from the step before.
    const rows = this.page.getByTestId("processing-records").getByRole("row");
    const before = (await this.page.getByTestId("processing-records").count()) ? await rows.count() : 1;
    await form.getByRole("button", { name: "Record step" }).click();
    await this.page.waitForFunction(
      (n) => (document.querySelector('[data-testid="processing-records"]')?.querySelectorAll("tr").length ?? 0) > n,
      before,
      { timeout: 30_000 },
    );
  }

  nibCost() {
    return this.page.getByTestId("nib-cost").textContent();
  }

  /** Money figures ("EUR 12.83") anywhere in the page's main area; empty when none is shown. */
  async moneyShown(): Promise<string[]> {
    return moneyIn(await this.page.locator("main").innerText());
  }

  cumulativeYield() {
    return this.page.getByTestId("cumulative-yield").textContent();
  }
}
