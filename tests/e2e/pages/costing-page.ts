import type { Page } from "playwright-core";
import { E2E_BASE_URL } from "../config";

/** A recipe's costing page: the three combinations, the supplier table and its source lists. */
export class CostingPage {
  constructor(private readonly page: Page) {}

  /** Opens the recipe from the Costing section, as a buyer would. */
  async openFromList(recipeName: string) {
    await this.page.goto(`${E2E_BASE_URL}/costing`);
    await this.page.getByRole("link", { name: recipeName, exact: true }).click();
    await this.page.waitForURL(/\/costing\/[0-9a-f-]{36}$/);
    await this.page.getByTestId("costing-recipe-name").waitFor();
  }

  chosenPerBar() {
    return this.page.getByTestId("scenario-chosen-per-bar").textContent();
  }

  chosenBreakdownPerBar() {
    return this.page.getByTestId("chosen-cost-per-bar").textContent();
  }

  preferredPerBar() {
    return this.page.getByTestId("scenario-preferred-per-bar").textContent();
  }

  /** Chooses the source of one ingredient and waits until the page shows `expected` as the chosen cost per bar. */
  async chooseSource(ingredient: string, source: string, expected: string) {
    await this.page.getByLabel(`Source of ${ingredient}`).selectOption({ label: source });
    await this.page.getByTestId("scenario-chosen-per-bar").filter({ hasText: expected }).waitFor();
  }

  /** The badges in the cell of `column` on the row of `ingredient`. */
  cellText(ingredient: string, columnIndex: number) {
    return this.page.getByTestId(`comparison-row-${ingredient}`).getByRole("cell").nth(columnIndex).textContent();
  }

  async resetToPreferred(expected: string) {
    await this.page.getByRole("button", { name: "Back to the preferred suppliers" }).click();
    await this.page.getByTestId("scenario-chosen-per-bar").filter({ hasText: expected }).waitFor();
  }
}
