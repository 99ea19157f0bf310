import type { Page } from "playwright-core";
import { E2E_BASE_URL } from "../config";

/** The recipe bench, as a formulator uses it. */
export class BenchPage {
  constructor(private readonly page: Page) {
    // Leaving with an unsaved draft asks first; these tests always mean to leave.
    page.on("dialog", (d) => void d.accept());
  }

  async open(recipeId: string) {
    await this.page.goto(`${E2E_BASE_URL}/recipes/${recipeId}`);
    await this.page.getByTestId("composition-panel").waitFor();
  }

  recipeId(): string {
    return new URL(this.page.url()).pathname.split("/")[2]!;
  }

  slider(name: string) {
    return this.page.getByRole("slider", { name, exact: true });
  }

  async exact(name: string): Promise<string> {
    return this.page.getByLabel(`${name}, exact percent`).inputValue();
  }

  async total(): Promise<string | null> {
    return this.page.getByTestId("lines-total").textContent();
  }

  async figure(key: string): Promise<string | null> {
    return this.page.getByTestId(`figure-${key}`).textContent();
  }

  /** Drags a slider's thumb with the mouse by `dx` pixels, in small steps like a hand would. */
  async drag(name: string, dx: number) {
    const box = await this.slider(name).boundingBox();
    if (!box) throw new Error(`no slider ${name}`);
    const x = box.x + box.width / 2;
    const y = box.y + box.height / 2;
    await this.page.mouse.move(x, y);
    await this.page.mouse.down();
    await this.page.mouse.move(x + dx, y, { steps: 12 });
    await this.page.mouse.up();
  }

  async press(name: string, key: string, times = 1) {
    await this.slider(name).focus();
    for (let i = 0; i < times; i++) await this.page.keyboard.press(key);
  }

  async save(note: string) {
    await this.page.getByPlaceholder(/What changed in v\d+/).fill(note);
    await this.page.getByRole("button", { name: /^Save as v\d+$/ }).click();
  }

  /** Waits until the bench shows `versionNo` as its saved base with nothing unsaved. */
  async waitForSaved(versionNo: number) {
    try {
      await this.page.getByTestId("draft-status").filter({ hasText: `No changes since v${versionNo}.` }).waitFor();
    } catch (err) {
      // Say what the bench showed instead, so a failure names its cause.
      const status = await this.page.getByTestId("draft-status").textContent().catch(() => null);
      const error = await this.page.getByTestId("save-error").textContent({ timeout: 500 }).catch(() => null);
      const saveButton = await this.page.getByRole("button", { name: /^(Save as v\d+|Saving…)$/ }).textContent({ timeout: 500 }).catch(() => null);
      throw new Error(`v${versionNo} not shown as saved; status: ${status}; error: ${error}; button: ${saveButton}`, { cause: err });
    }
  }

  conflict() {
    return this.page.getByTestId("conflict-dialog");
  }

  /** Opens a recipe's bench from the recipe list by its name. */
  async openByName(name: string) {
    await this.page.goto(`${E2E_BASE_URL}/recipes`);
    await this.page.getByRole("link", { name, exact: true }).click();
    await this.page.waitForURL(/\/recipes\/[0-9a-f-]{36}$/);
    await this.page.getByTestId("composition-panel").waitFor();
  }

  costPerKg() {
    return this.page.getByTestId("cost-per-kg").textContent();
  }

  costPerBar() {
    return this.page.getByTestId("cost-per-bar").textContent();
  }

  /** Chooses the price source of a nibs or cocoa liquor line: the option whose name starts with `option`. */
  async choosePriceSource(ingredient: string, option: string) {
    await this.page.getByRole("combobox", { name: `Price source of ${ingredient}` }).click();
    const escaped = option.replace(/[.*+?^${}()|[\]\\]/g, "\\$&");
    await this.page.getByRole("option", { name: new RegExp(`^${escaped}`) }).click();
  }
}
