import type { Page } from "playwright-core";
import { DEMO_PASSWORD } from "@/db/seed";
import { E2E_BASE_URL } from "../config";

/** The sign-in form, as a user sees it. */
export class SignInPage {
  constructor(private readonly page: Page) {}

  async open() {
    await this.page.goto(`${E2E_BASE_URL}/sign-in`);
  }

  async signIn(email: string, password = DEMO_PASSWORD) {
    await this.page.getByLabel("E-mail").fill(email);
    await this.page.getByLabel("Password").fill(password);
    await this.page.getByRole("button", { name: "Sign in" }).click();
  }

  formError() {
    return this.page.getByTestId("form-error");
  }
}

/** Signs `email` in on `page` from a clean slate (no cookies of the previous person), landing on the overview. */
export async function signInFresh(page: Page, email: string) {
  await page.context().clearCookies();
  const signIn = new SignInPage(page);
  await signIn.open();
  await signIn.signIn(email);
  await page.waitForURL(`${E2E_BASE_URL}/overview`);
}
