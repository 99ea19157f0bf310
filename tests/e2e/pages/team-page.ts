import type { Page } from "playwright-core";
import { E2E_BASE_URL } from "../config";

/** Settings → Team: people, roles, invitations. */
export class TeamPage {
  constructor(private readonly page: Page) {}

  async open() {
    await this.page.goto(`${E2E_BASE_URL}/settings/members`);
  }

  async invite(email: string, roleLabel: RegExp) {
    await this.page.getByLabel("E-mail").fill(email);
    await this.page.getByRole("combobox", { name: "Role", exact: true }).click();
    await this.page.getByRole("option", { name: roleLabel }).click();
    await this.page.getByRole("button", { name: "Send invitation" }).click();
    await this.page.getByTestId("form-success").waitFor();
  }

  inviteButton() {
    return this.page.getByRole("button", { name: "Send invitation" });
  }
}
