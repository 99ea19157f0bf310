import { randomBytes } from "node:crypto";
import type { BrowserContext } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { launchBrowser } from "./browser";
import { E2E_BASE_URL } from "./config";
import { TeamPage } from "./pages/team-page";

let owner: BrowserContext;
let buyer: BrowserContext;

beforeAll(async () => {
  owner = await launchBrowser();
  buyer = await launchBrowser();
});
afterAll(async () => {
  await owner?.close();
  await buyer?.close();
});

describe("a new workspace inviting its buyer", () => {
  it("signs up, invites a buyer by e-mail, and the buyer joins from the link with buyer rights only", async () => {
    const tag = randomBytes(3).toString("hex");
    const ownerEmail = `founder-${tag}@kestrel.example`;
    const buyerEmail = `buyer-${tag}@kestrel.example`;

    // The owner signs up.
    const page = owner.pages()[0] ?? (await owner.newPage());
    await page.goto(`${E2E_BASE_URL}/sign-up`);
    await page.getByLabel("Your name").fill("Ines Kestrel");
    await page.getByLabel("Business name").fill(`Kestrel Cocoa ${tag}`);
    await page.getByLabel("E-mail").fill(ownerEmail);
    await page.getByLabel("Password").fill("stone-ground-for-48h");
    await page.getByRole("button", { name: "Create workspace" }).click();
    await page.waitForURL(`${E2E_BASE_URL}/overview`);
    expect(await page.getByRole("heading", { level: 1 }).textContent()).toBe(`Kestrel Cocoa ${tag}`);
    // A new workspace's owner gets the first steps, none of them done yet.
    const setup = page.locator('[data-testid="overview-setup"]:visible');
    await setup.waitFor();
    expect(await setup.locator("li[data-done=true]").count()).toBe(0);
    expect(await setup.getByRole("link", { name: "Invite your team" }).getAttribute("href")).toBe("/settings/members");

    // … invites a buyer …
    const team = new TeamPage(page);
    await team.open();
    await team.invite(buyerEmail, /^buyer/);
    expect(await page.getByRole("cell", { name: buyerEmail, exact: true }).count()).toBe(1);

    // … and finds the e-mail in the demo mailbox.
    await page.getByRole("link", { name: "Mailbox" }).click();
    await page.waitForURL(`${E2E_BASE_URL}/settings/mailbox`);
    const mail = page.getByTestId("captured-mail").filter({ hasText: buyerEmail }).first();
    expect(await mail.getByRole("heading").textContent()).toBe(`Ines Kestrel invites you to Kestrel Cocoa ${tag} on Barwright`);
    const link = await mail.getByRole("link").getAttribute("href");
    expect(link).toMatch(new RegExp(`^${E2E_BASE_URL}/invitations/[A-Za-z0-9_-]+$`));

    // The buyer opens the link in another browser and creates an account.
    const b = buyer.pages()[0] ?? (await buyer.newPage());
    await b.goto(link!);
    expect(await b.getByRole("heading", { level: 1 }).textContent()).toBe(`Join Kestrel Cocoa ${tag}`);
    await b.getByLabel("Your name").fill("Oren Buyer");
    await b.getByLabel("Choose a password").fill("quotes-and-price-lists");
    await b.getByRole("button", { name: "Create account and join" }).click();
    await b.waitForURL(`${E2E_BASE_URL}/overview`);
    expect(await b.getByText("Signed in as Oren Buyer").count()).toBe(1);

    // The buyer sees the team but none of the owner's controls, and the server refuses them too.
    await b.goto(`${E2E_BASE_URL}/settings/members`);
    expect(await b.getByRole("cell", { name: "Oren Buyer" }).count()).toBe(1);
    expect(await b.getByRole("button", { name: "Send invitation" }).count()).toBe(0);
    expect(await b.getByRole("link", { name: "Mailbox" }).count()).toBe(0);
    const status = await b.evaluate(async () => {
      const res = await fetch("/api/invitations", {
        method: "POST",
        headers: { "content-type": "application/json" },
        body: JSON.stringify({ email: "someone@kestrel.example", role: "owner" }),
      });
      return res.status;
    });
    expect(status).toBe(403);
    await b.goto(`${E2E_BASE_URL}/settings/mailbox`);
    // The not-found page may stream in after the loading skeleton: wait for it rather than count at once.
    await b.getByRole("heading", { name: "Not found" }).waitFor({ timeout: 15_000 });
    expect(await b.getByTestId("captured-mail").count()).toBe(0);

    // The used link cannot be used again.
    const again = await owner.newPage();
    await again.goto(link!);
    expect(await again.getByTestId("invitation-problem").textContent()).toMatch(/already been used/);
  });
});
