import type { Locator, Page } from "playwright-core";

/** The bench's least-cost panel, as a formulator uses it. */
export class LeastCostPanel {
  readonly root: Locator;

  constructor(private readonly page: Page) {
    this.root = page.getByTestId("least-cost-panel");
  }

  /** Waits until the solver has loaded in the page (the button is enabled only then). */
  async ready() {
    // The panel loads when it scrolls near the viewport.
    await this.page.getByTestId("least-cost-slot").scrollIntoViewIfNeeded();
    const find = this.root.getByRole("button", { name: "Find least-cost mix" });
    await find.waitFor();
    await this.page.waitForFunction((el) => !(el as HTMLButtonElement).disabled, await find.elementHandle(), { timeout: 30_000 });
  }

  failure() {
    return this.root.getByText("The solver could not load", { exact: false });
  }

  async setMin(line: string, value: string) {
    await this.root.getByLabel(`Minimum for ${line}`).fill(value);
  }

  async find() {
    await this.root.getByRole("button", { name: "Find least-cost mix" }).click();
  }

  /** The proposal's rows: line name → [now, proposed, change] as shown. */
  async proposal(): Promise<Map<string, [string, string, string]>> {
    const table = this.root.getByTestId("least-cost-proposal");
    await table.waitFor();
    const rows = await table.locator("tbody tr").evaluateAll((trs) => trs.map((tr) => Array.from(tr.querySelectorAll("td"), (td) => td.textContent ?? "")));
    return new Map(rows.map(([name, now, proposed, change]) => [name!, [now!, proposed!, change!]]));
  }

  /** Waits until the proposal shows `percent` for `line` (it follows each change of a bound). */
  async waitForProposed(line: string, percent: string) {
    await this.root.getByTestId("least-cost-proposal").locator("tr", { hasText: line }).locator("td").nth(2).filter({ hasText: new RegExp(`^${percent.replace(".", "\\.")}$`) }).waitFor();
  }

  text(testId: string) {
    return this.root.getByTestId(testId).textContent();
  }

  async listed(testId: string): Promise<string[]> {
    return this.root.getByTestId(testId).locator("li").allTextContents();
  }

  conflict() {
    return this.root.getByTestId("least-cost-conflict");
  }

  async apply() {
    await this.root.getByRole("button", { name: "Apply as draft" }).click();
  }
}
