import type { Page } from "playwright-core";
import { E2E_BASE_URL } from "../config";
import { moneyIn } from "./money";

/** The pages that show money outside Costing, read the way a person scans them for prices. */
export class MoneyPages {
  constructor(private readonly page: Page) {}

  private async mainMoney() {
    return moneyIn(await this.page.locator("main").innerText());
  }

  /** The ingredient library once its rows have loaded: its column headers and the money in it. */
  async ingredientList() {
    await this.page.goto(`${E2E_BASE_URL}/ingredients`);
    await this.page.getByTestId("ingredient-Sugar (sucrose)").waitFor();
    return { headers: await this.page.getByRole("columnheader").allTextContents(), money: await this.mainMoney() };
  }

  /** A bean lot's page, opened from the list. */
  async lot(code: string) {
    await this.page.goto(`${E2E_BASE_URL}/lots`);
    await this.page.getByRole("link", { name: code, exact: true }).click();
    await this.page.waitForURL(/\/lots\/[0-9a-f-]{36}$/);
    await this.page.getByTestId("cumulative-yield").waitFor();
    return { nibCost: await this.page.getByTestId("nib-cost").count(), money: await this.mainMoney() };
  }

  async recipeList() {
    await this.page.goto(`${E2E_BASE_URL}/recipes`);
    await this.page.getByTestId("recipe-row").first().waitFor();
    return { headers: await this.page.getByRole("columnheader").allTextContents(), money: await this.mainMoney() };
  }

  /** The overview: whether it has the margins card, and the money on it. */
  async overview() {
    await this.page.goto(`${E2E_BASE_URL}/overview`);
    await this.page.locator('[data-testid="overview-production"]:visible').waitFor();
    return { margins: await this.page.locator('[data-testid="overview-margins"]:visible').count(), money: await this.mainMoney() };
  }

  /** The owner's switch on the Costing page; waits for the saved message. */
  async shareCosts(show: boolean) {
    await this.page.goto(`${E2E_BASE_URL}/costing`);
    const toggle = this.page.getByLabel("Show costs, prices and margins to production and viewers");
    if ((await toggle.isChecked()) === show) return;
    await toggle.click();
    await this.page.getByText(show ? "Production and viewers now see costs." : "Costs are hidden from production and viewers again.").waitFor();
  }
}
