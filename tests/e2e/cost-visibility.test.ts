import type { Page } from "playwright-core";
import { describe, expect, it } from "vitest";
import { onePagePerFile } from "./page-per-file";
import { MoneyPages } from "./pages/money-pages";
import { signInFresh } from "./pages/sign-in-page";

let page: Page;
onePagePerFile((opened) => (page = opened));

const signInAs = (email: string) => signInFresh(page, email);

const costingLink = () => page.getByRole("navigation", { name: "Sections" }).getByRole("link", { name: "Costing" });

// Demo lot EC-2026-07 and the demo ingredient prices are invented (db/demo/lots.ts, db/demo/ingredients.ts).
describe("money for production", () => {
  it("is hidden until the owner shares costs, then shown, then hidden again", async () => {
    const pages = new MoneyPages(page);
    try {
      await signInAs("joss@fenwicklane.example");
      expect(await costingLink().count()).toBe(0);
      const ingredients = await pages.ingredientList();
      expect(ingredients.headers.join("|")).not.toContain("Current price");
      expect(ingredients.headers.join("|")).toContain("Preferred supplier");
      expect(ingredients.money).toEqual([]);
      expect(await pages.lot("EC-2026-07")).toEqual({ nibCost: 0, money: [] });
      const recipes = await pages.recipeList();
      expect(recipes.headers.join("|")).not.toContain("Cost per bar");
      expect(recipes.headers.join("|")).toContain("Cocoa");
      expect(recipes.money).toEqual([]);
      expect(await pages.overview()).toEqual({ margins: 0, money: [] });

      await signInAs("mara@fenwicklane.example");
      await pages.shareCosts(true);

      await signInAs("joss@fenwicklane.example");
      expect(await costingLink().count()).toBe(1);
      const pricedIngredients = await pages.ingredientList();
      expect(pricedIngredients.headers.join("|")).toContain("Current price");
      expect(pricedIngredients.money.length).toBeGreaterThan(0);
      const lot = await pages.lot("EC-2026-07");
      expect(lot.nibCost).toBe(1);
      expect(lot.money.length).toBeGreaterThan(0);
      const pricedRecipes = await pages.recipeList();
      expect(pricedRecipes.headers.join("|")).toContain("Cost per bar");
      expect(pricedRecipes.money.length).toBeGreaterThan(0);
      const overview = await pages.overview();
      expect(overview.margins).toBe(1);
      expect(overview.money.length).toBeGreaterThan(0);
    } finally {
      // Later browser tests share the demo workspace and expect costs kept from production.
      await signInAs("mara@fenwicklane.example");
      await pages.shareCosts(false);
    }
    await signInAs("joss@fenwicklane.example");
    expect((await pages.ingredientList()).money).toEqual([]);
  });
});
