import type { BrowserContext, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { DEMO_PEOPLE } from "@/db/seed";
import { launchBrowser } from "./browser";
import { E2E_BASE_URL } from "./config";
import { BenchPage } from "./pages/bench-page";
import { LeastCostPanel } from "./pages/least-cost-panel";
import { SignInPage } from "./pages/sign-in-page";

let context: BrowserContext;
let page: Page;
const theo = DEMO_PEOPLE.find((p) => p.role === "formulator")!;

beforeAll(async () => {
  context = await launchBrowser();
  page = context.pages()[0] ?? (await context.newPage());
});
afterAll(async () => {
  await context?.close();
});

const nibs = "Cocoa nibs (roasted)";
const butter = "Cocoa butter";
const sugar = "Sugar (sucrose)";
const lecithin = "Soy lecithin";
const vanilla = "Vanilla (ground pods)";

// Hand-worked (demo data, invented prices: db/demo/ingredients.ts; the same figures as costing.test.ts).
// House dark 70 % v3: nibs 64 at 16.20 EUR/kg (cocoa butter 55 + non-fat cocoa 43 = 98 % dry cocoa solids,
// REFERENCE.md §3, common practice for nibs), cocoa butter 7.3 at 19.80, sugar 28.3 at 985 GBP/t × 1.149
// = 1.131765, lecithin 0.3 at 6.80 GBP × 1.149, vanilla 0.1 at 420 GBP × 1.149 → 12.639709095 EUR/kg now.
// Cheapest with dry cocoa solids ≥ 70 % (EU basis) and cocoa butter ≥ 8 %: cocoa costs 16.20 / 0.98 = 16.53
// EUR per kg of solids from nibs and 19.80 from butter, so butter stays at its minimum 8, nibs give the
// other 62: 62 / 0.98 = 63.265… → 63.3 on the 0.1 % grid (63.2 gives 69.936 < 70); sugar the rest, 28.7;
// lecithin and vanilla nothing (no chosen limit needs them). Cost 0.633 × 16.20 + 0.08 × 19.80 + 0.287 ×
// 1.131765 = 12.163416555 → 12.16; difference −0.476292540 → −0.48. With butter ≥ 9: nibs 61 / 0.98 =
// 62.244… → 62.3, sugar 28.7. EU chocolate (Directive 2000/36/EC Annex I A.3) and Codex chocolate
// (CXS 87-1981 §2.1.1) both hold at 70.034 % dry cocoa solids.
describe("the least-cost mix on the bench", () => {
  it("proposes the cheapest compliant mix, follows a bound, explains a conflict, and applies as an unsaved draft", async () => {
    const signIn = new SignInPage(page);
    await signIn.open();
    await signIn.signIn(theo.email);
    await page.waitForURL(`${E2E_BASE_URL}/overview`);
    const bench = new BenchPage(page);
    await bench.openByName("House dark 70 %");
    const panel = new LeastCostPanel(page);
    await panel.ready();
    expect(await panel.failure().count()).toBe(0);

    // At least 8 % added cocoa butter, then run the solver in the page (HiGHS, WebAssembly).
    await panel.setMin(butter, "8");
    await panel.find();
    const proposal = await panel.proposal();
    expect([...proposal.keys()]).toEqual([nibs, butter, sugar, lecithin, vanilla]);
    expect(proposal.get(nibs)).toEqual(["64.0", "63.3", "−0.7"]);
    expect(proposal.get(butter)).toEqual(["7.3", "8.0", "+0.7"]);
    expect(proposal.get(sugar)).toEqual(["28.3", "28.7", "+0.4"]);
    expect(proposal.get(lecithin)?.[1]).toBe("0.0");
    expect(proposal.get(vanilla)?.[1]).toBe("0.0");
    expect(await panel.text("least-cost-cost")).toBe("12.16 EUR");
    expect(await panel.text("least-cost-saving")).toBe("−0.48 EUR");
    expect(await panel.listed("least-cost-binding")).toEqual(["at least 8 % Cocoa butter", "total dry cocoa solids ≥ 70 % (EU basis)"]);
    expect(await panel.root.getByTestId("least-cost-standards").textContent()).toBe("EU chocolate: meetsCodex chocolate: meets");

    // The proposal follows a bound as it is typed, without pressing the button again.
    await panel.setMin(butter, "9");
    await panel.waitForProposed(butter, "9.0");
    expect((await panel.proposal()).get(nibs)?.[1]).toBe("62.3");

    // 40 % sugar leaves at most 60 % for cocoa: the explanation names the two limits that conflict.
    await panel.setMin(sugar, "40");
    await panel.conflict().waitFor();
    expect(await panel.conflict().locator("p").first().textContent()).toBe(
      "At least 40 % Sugar (sucrose) and total dry cocoa solids ≥ 70 % (EU basis) cannot both hold with these ingredients.",
    );
    expect(await panel.listed("least-cost-conflict")).toEqual(["at least 40 % Sugar (sucrose)", "total dry cocoa solids ≥ 70 % (EU basis)"]);

    // Back to the feasible bounds, then apply: the bench takes the proposal as an unsaved draft.
    await panel.setMin(sugar, "");
    await panel.setMin(butter, "8");
    await panel.waitForProposed(butter, "8.0");
    await panel.apply();
    await page.getByTestId("draft-status").filter({ hasText: /^Draft: unsaved changes/ }).waitFor();
    expect(await bench.exact(nibs)).toBe("63.3");
    expect(await bench.exact(butter)).toBe("8.0");
    expect(await bench.exact(sugar)).toBe("28.7");
    expect(await bench.exact(lecithin)).toBe("0.0");
    expect(await bench.exact(vanilla)).toBe("0.0");
    expect(await bench.total()).toBe("100.0 %");
    expect(await bench.figure("totalDryCocoaSolids")).toBe("70.0 %");
    expect(await bench.costPerKg()).toBe("12.16 EUR");
    // Nothing was saved: the shared demo recipe is unchanged for the tests that follow.
  });
});
