import { beforeEach, describe, expect, it } from "vitest";
import { GET as exportIngredients } from "@/app/api/ingredients/export/route";
import { GET as exportQuotes } from "@/app/api/quotes/export/route";
import { createTeam, signInAs, type TeamFixture } from "../support/fixtures";
import { makeIngredient, makeQuote, makeSupplier } from "../support/ingredients";
import { base, params } from "../support/matrix";
import { freshRequest } from "../support/request";

let team: TeamFixture;
beforeEach(async () => {
  team = await createTeam("export");
  freshRequest();
  await signInAs(team.people.viewer.id, team.workspaceId);
});

// OWASP "CSV Injection": a cell starting with = + - @ (or tab / CR) must not reach a spreadsheet as a formula.
describe("CSV export", () => {
  it("escapes formula-looking ingredient names and notes", async () => {
    await makeIngredient(team.workspaceId, { name: '=HYPERLINK("http://evil.example","Sugar")', notes: "@SUM(A1:A9)" });
    await makeIngredient(team.workspaceId, { name: "+Cane sugar", notes: "-1+1" });
    const res = await exportIngredients(new Request(`${base}/api/ingredients/export`), params());
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toBe("text/csv; charset=utf-8");
    expect(res.headers.get("content-disposition")).toBe('attachment; filename="ingredients.csv"');
    const text = await res.text();
    expect(text).toContain('"\'=HYPERLINK(""http://evil.example"",""Sugar"")"');
    expect(text).toContain('"\'@SUM(A1:A9)"');
    expect(text).toContain('"\'+Cane sugar"');
    expect(text).toContain('"\'-1+1"');
    // No line of the file starts a cell with a bare formula character.
    for (const line of text.replace(/^\uFEFF/, "").split("\r\n")) expect(line).not.toMatch(/(^|,)"[=+\-@]/);
  });

  it("exports quotes with prices per kg in the base currency, escaping supplier names", async () => {
    // Quotes are prices: the buyer's export (a viewer gets 403 while costs are not shared; cost-visibility.test.ts).
    freshRequest();
    await signInAs(team.people.buyer.id, team.workspaceId);
    const supplier = await makeSupplier(team.workspaceId, { name: "=cmd|' /C calc'!A0" });
    const sugar = await makeIngredient(team.workspaceId, { name: "Sugar X" });
    await makeQuote(team.workspaceId, team.people.buyer.id, { supplierId: supplier.id, ingredientId: sugar.id, price: "985", unit: "per_tonne" });
    const text = await (await exportQuotes(new Request(`${base}/api/quotes/export`), params())).text();
    const [header, row] = text.replace(/^\uFEFF/, "").split("\r\n");
    expect(header).toMatch(/^"Ingredient","Supplier","Price","Currency","Unit"/);
    expect(row).toBe(`"Sugar X","'=cmd|' /C calc'!A0","985","EUR","per tonne","","","2026-01-01","","0.985","yes","manual",${row!.split(",").at(-1)}`);
  });
});
