import type { Page } from "playwright-core";
import { E2E_BASE_URL } from "../config";

/** Prices → Upload a price list: supplier, file, column mapping, row verdicts, import. */
export class PriceListPage {
  constructor(private readonly page: Page) {}

  async open() {
    await this.page.goto(`${E2E_BASE_URL}/prices/upload`);
  }

  async chooseSupplier(name: RegExp) {
    await this.page.getByRole("combobox", { name: "Supplier", exact: true }).click();
    await this.page.getByRole("option", { name }).click();
  }

  async chooseFile(name: string, text: string) {
    await this.page.getByLabel("Price list (CSV)").setInputFiles({ name, mimeType: "text/csv", buffer: Buffer.from(text, "utf8") });
  }

  async read() {
    await this.page.getByRole("button", { name: "Read the file" }).click();
    await this.page.getByTestId("price-list-counts").waitFor();
  }

  counts() {
    return this.page.getByTestId("price-list-counts").textContent();
  }

  row(n: number) {
    return this.page.getByTestId(`row-${n}`);
  }

  importButton() {
    return this.page.getByRole("button", { name: /^Import \d+ new quotes?$/ });
  }

  async importRows() {
    await this.importButton().click();
    await this.page.getByTestId("price-list-outcome").waitFor();
  }

  outcome() {
    return this.page.getByTestId("price-list-outcome").textContent();
  }

  quoteRow(ingredient: string, validFrom: string) {
    return this.page.getByTestId(`quote-${ingredient}-${validFrom}`);
  }
}
