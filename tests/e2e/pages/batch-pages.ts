import type { Page } from "playwright-core";
import { E2E_BASE_URL } from "../config";

/** Batches → Plan a batch: the form and its live preview. */
export class PlanBatchPage {
  constructor(private readonly page: Page) {}

  async open() {
    await this.page.goto(`${E2E_BASE_URL}/batches/new`);
  }

  private async choose(combobox: string, option: RegExp) {
    await this.page.getByRole("combobox", { name: combobox, exact: true }).click();
    await this.page.getByRole("option", { name: option }).click();
  }

  async fill(fields: { recipe: RegExp; amount: string; unit: RegExp; machine: RegExp; station: RegExp }) {
    await this.choose("Recipe", fields.recipe);
    await this.page.getByLabel("Batch size").fill(fields.amount);
    await this.choose("Unit", fields.unit);
    await this.choose("Machine", fields.machine);
    await this.choose("Weighing station", fields.station);
  }

  previewTotal() {
    return this.page.getByTestId("preview-total").textContent();
  }

  preview() {
    return this.page.getByTestId("plan-preview");
  }

  async submit() {
    await this.page.getByRole("button", { name: "Plan batch" }).click();
    await this.page.waitForURL(/\/batches\/[0-9a-f-]{36}$/);
  }
}

/** A batch's page: its plan, the run form and, once recorded, the run. */
export class BatchPage {
  constructor(private readonly page: Page) {}

  code() {
    return this.page.getByTestId("batch-code").textContent();
  }

  /** Fills the run form; `actuals` maps an ingredient to its mass and lot code. */
  async recordRun(actuals: Record<string, { actual: string; lot?: string }>, times: { started: string; ended: string; tolerance: string }) {
    const form = this.page.getByRole("form", { name: "Record the run" });
    for (const [ingredient, { actual, lot }] of Object.entries(actuals)) {
      await form.getByLabel(`Actual ${ingredient}`, { exact: true }).fill(actual);
      if (lot) await form.getByLabel(`Lot code ${ingredient}`, { exact: true }).fill(lot);
    }
    await form.getByLabel("Started").fill(times.started);
    await form.getByLabel("Ended").fill(times.ended);
    await form.getByLabel("Tolerance").fill(times.tolerance);
    await form.getByRole("button", { name: "Complete the run" }).click();
    await this.page.getByTestId("run-record").waitFor();
  }

  flaggedRows() {
    return this.page.getByTestId("run-record").locator("tr[data-flagged]");
  }
}
