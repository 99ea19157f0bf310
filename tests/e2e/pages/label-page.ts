import type { Page } from "playwright-core";
import { E2E_BASE_URL } from "../config";

/** A recipe's label page, as a user sees it. */
export class LabelPage {
  constructor(private readonly page: Page) {}

  /** From the recipe list to the recipe, then its Label tab. */
  async openFromRecipes(recipeName: string) {
    await this.page.goto(`${E2E_BASE_URL}/recipes`);
    await this.page.getByRole("link", { name: recipeName, exact: true }).first().click();
    await this.page.getByTestId("recipe-name").waitFor();
    await this.page.getByRole("navigation", { name: "Recipe" }).getByRole("link", { name: "Label" }).click();
    await this.page.getByTestId("label-sheet").waitFor();
  }

  async open(recipeId: string) {
    await this.page.goto(`${E2E_BASE_URL}/recipes/${recipeId}/label`);
    await this.page.getByTestId("label-sheet").waitFor();
  }

  recipeId(): string {
    return /\/recipes\/([0-9a-f-]{36})\/label/.exec(this.page.url())![1]!;
  }

  /** The EU table's per-100 g figure of a row ("energy", "fat", …), lines joined by " / ". */
  async euPer100g(row: string): Promise<string> {
    const cell = this.page.getByTestId("eu-nutrition-table").locator(`tr[data-row="${row}"] td`).first();
    return (await cell.locator("span").allInnerTexts()).join(" / ");
  }

  async usFigure(testId: "us-calories" | "us-serving-size" | "us-servings"): Promise<string> {
    return (await this.page.getByTestId(testId).innerText()).trim();
  }

  /** The US panel's per-serving amount and % DV of a row ("fat", "sodium", …). */
  async usRow(row: string): Promise<string[]> {
    return (await this.page.getByTestId("us-nutrition-panel").locator(`tr[data-row="${row}"] td`).allInnerTexts()).slice(0, 2).map((t) => t.trim());
  }

  async text(testId: string): Promise<string> {
    return (await this.page.getByTestId(testId).innerText()).trim();
  }

  /** The words set in bold in the EU ingredient list (the allergens). */
  async boldInEuIngredients(): Promise<string[]> {
    return this.page.getByTestId("eu-ingredients").locator("strong").allInnerTexts();
  }

  settingsForm() {
    return this.page.getByRole("form", { name: "Label details" });
  }

  async saveSettings(fields: { mayContain?: string; pieces?: string; portion?: string }) {
    const form = this.settingsForm();
    if (fields.mayContain !== undefined) await form.getByLabel("May contain (cross-contact)").fill(fields.mayContain);
    if (fields.pieces !== undefined) await form.getByLabel("Pieces per bar").fill(fields.pieces);
    if (fields.portion !== undefined) await form.getByLabel("EU portion").fill(fields.portion);
    await form.getByRole("button", { name: "Save label details" }).click();
  }
}
