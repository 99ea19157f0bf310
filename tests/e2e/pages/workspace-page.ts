import type { Page } from "playwright-core";
import { E2E_BASE_URL } from "../config";

/** Settings → Workspace: "Backup and move" (download an export, import one as a new workspace). */
export class WorkspacePage {
  constructor(private readonly page: Page) {}

  async open() {
    await this.page.goto(`${E2E_BASE_URL}/settings/workspace`);
    await this.page.getByTestId("backup-and-move").waitFor();
  }

  /** The way an owner finds it: the account menu under their initials. */
  async openFromMenu() {
    await this.page.getByRole("button", { name: /Account menu/ }).click();
    await this.page.getByRole("menuitem", { name: "Workspace: backup and move" }).click();
    await this.page.waitForURL(`${E2E_BASE_URL}/settings/workspace`);
    await this.page.getByTestId("backup-and-move").waitFor();
  }

  /** Clicks "Download with files" and returns the saved file's path and suggested name. */
  async download(): Promise<{ path: string; name: string }> {
    const [download] = await Promise.all([
      this.page.waitForEvent("download"),
      this.page.getByRole("link", { name: "Download with files" }).click(),
    ]);
    return { path: (await download.path())!, name: download.suggestedFilename() };
  }

  async importFile(path: string) {
    await this.page.getByLabel(/^Export file/).setInputFiles(path);
    await this.page.getByRole("button", { name: "Import as a new workspace" }).click();
  }

  done() {
    return this.page.getByTestId("import-done");
  }

  error() {
    return this.page.getByTestId("workspace-import").getByTestId("form-error");
  }
}
