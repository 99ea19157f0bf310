import { execFileSync } from "node:child_process";
import { mkdtempSync, readFileSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import type { Page } from "playwright-core";
import { describe, expect, it } from "vitest";
import { onePagePerFile } from "./page-per-file";
import { E2E_BASE_URL } from "./config";
import { LabelPage } from "./pages/label-page";
import { signInFresh } from "./pages/sign-in-page";

let page: Page;
onePagePerFile((opened) => (page = opened));

const signInAs = (email: string) => signInFresh(page, email);

/** The text of a PDF, by poppler-utils' pdftotext (a test tool of the project). */
function pdfText(bytes: Buffer): string {
  const file = path.join(mkdtempSync(path.join(tmpdir(), "barwright-label-")), "label.pdf");
  writeFileSync(file, bytes);
  return execFileSync("pdftotext", ["-layout", file, "-"], { encoding: "utf8" });
}

// The demo's "House dark 70 %", released v2: 64 nibs, 7.3 cocoa butter, 28.4 sugar, 0.3 soy lecithin, 70 g.
// Figures worked by hand in tests/integration/labels.test.ts (same recipe): per 100 g 2408 kJ / 580 kcal,
// fat 43 g, saturates 25 g, carbohydrate 35 g, sugars 29 g, fibre 9.9 g, protein 8.5 g, salt 0.04 g
// (Regulation (EU) No 1169/2011 Annex XIV; EC rounding guidance Dec 2012, from memory). US: 70 g is
// 233 % of the 30 g reference amount (21 CFR 101.12(b)) → 1/2 bar (35 g), 2 servings, two columns;
// 210 kcal per serving (4/4/9 on unrounded amounts, 21 CFR 101.9(c)(1)(i)(B); nearest 10 above 50).
describe("the label of a demo recipe", () => {
  it("shows the released version's EU table, US panel and statements, takes the maker's details and prints", async () => {
    await signInAs("theo@fenwicklane.example");
    const label = new LabelPage(page);
    await label.openFromRecipes("House dark 70 %");
    expect(await page.getByRole("navigation", { name: "Label of version" }).getByRole("link", { name: /v2/ }).getAttribute("aria-current")).toBe("page");
    expect(await page.getByRole("navigation", { name: "Recipe" }).getByRole("link", { name: "Label" }).getAttribute("aria-current")).toBe("page");

    const eu: Record<string, string> = {};
    for (const row of ["energy", "fat", "saturates", "carbohydrate", "sugars", "fibre", "protein", "salt"]) eu[row] = await label.euPer100g(row);
    expect(eu).toEqual({ energy: "2408 kJ / 580 kcal", fat: "43 g", saturates: "25 g", carbohydrate: "35 g", sugars: "29 g", fibre: "9.9 g", protein: "8.5 g", salt: "0.04 g" });
    expect([await label.usFigure("us-serving-size"), await label.usFigure("us-servings"), await label.usFigure("us-calories")]).toEqual(["1/2 bar (35g)", "2 servings per container", "210"]);
    // Per 35 g: fat 14.98 → 15 g, 15 / 78 = 19 %; sodium 5.09 mg → 5 mg, 0 % (Appendix H; DVs 101.9(c)(9), from memory).
    expect(await label.usRow("fat")).toEqual(["15g", "19%"]);
    expect(await label.usRow("sodium")).toEqual(["5mg", "0%"]);
    // Soy lecithin is not exempt: "soya" in bold (Regulation (EU) No 1169/2011 Annex II point 6, Art. 21(1)(b)).
    expect(await label.boldInEuIngredients()).toEqual(["soya"]);
    expect(await label.text("eu-ingredients")).toBe("Ingredients: cocoa nibs, sugar, cocoa butter, emulsifier (soya lecithin).");
    expect(await label.text("us-contains")).toBe("Contains: Soy.");
    // 64 × 0.98 + 7.3 = 70.02 % dry cocoa solids → "70 % minimum" (Directive 2000/36/EC Art. 3, from memory).
    expect(await label.text("solids-statement")).toBe("cocoa solids: 70 % minimum.");
    expect(await page.getByTestId("label-caution").first().innerText()).toContain("qualified person");

    // A refused value stays in its field beside the message; nothing is saved.
    await label.saveSettings({ pieces: "2.5" });
    expect(await label.settingsForm().getByRole("alert").filter({ hasText: "whole number" }).innerText()).toBe("Enter the number of pieces as a whole number, like 12.");
    expect(await label.settingsForm().getByLabel("Pieces per bar").inputValue()).toBe("2.5");

    // The maker's details: cross-contact, 12 pieces, a 25 g EU portion.
    await label.saveSettings({ mayContain: "milk, sesame", pieces: "12", portion: "25" });
    await page.getByTestId("form-success").waitFor();
    await page.getByTestId("label-may-contain").first().filter({ hasText: "May contain milk, sesame." }).waitFor();
    // 12 pieces of 5.83 g: 5 pieces (29 g) closest to 30 g; 12 / 5 = 2.4 → "about 2.5" (101.9(b)(2)(i), (b)(8)(i)).
    expect(await label.usFigure("us-serving-size")).toBe("5 pieces (29g)");
    expect(await label.usFigure("us-servings")).toBe("about 2.5 servings per container");

    // The PDF is printed on the server from the print page, as this user.
    const [download] = await Promise.all([page.waitForEvent("download", { timeout: 90_000 }), page.getByRole("link", { name: "PDF (A4)" }).click()]);
    expect(download.suggestedFilename()).toBe("label-house-dark-70-v2.pdf");
    const pdf = readFileSync((await download.path())!);
    expect(pdf.subarray(0, 5).toString()).toBe("%PDF-");
    const text = pdfText(pdf);
    for (const expected of ["Nutrition Facts", "2408 kJ", "580 kcal", "May contain milk, sesame.", "cocoa solids: 70 % minimum.", "qualified person"]) expect(text).toContain(expected);

    // Put the demo's details back for other tests.
    await label.saveSettings({ mayContain: "milk, hazelnuts", pieces: "", portion: "" });
    await page.getByTestId("label-may-contain").first().filter({ hasText: "May contain milk, hazelnuts." }).waitFor();
  }, 180_000);

  it("shows production the released version only, without the details form", async () => {
    await signInAs("theo@fenwicklane.example");
    const label = new LabelPage(page);
    await label.openFromRecipes("House dark 70 %");
    const recipeId = label.recipeId();
    await signInAs("joss@fenwicklane.example");
    await label.open(recipeId);
    expect(await page.getByRole("navigation", { name: "Label of version" }).getByRole("link").allInnerTexts()).toEqual(["v2 released"]);
    expect(await label.settingsForm().count()).toBe(0);
    // v3 is not released: production gets the not-found page (streamed, so the status stays 200).
    await page.goto(`${E2E_BASE_URL}/recipes/${recipeId}/label?version=3`);
    await page.getByRole("heading", { name: "That recipe or version is not here" }).waitFor();
    expect(await page.getByTestId("label-sheet").count()).toBe(0);
  });
});
