import { beforeEach, describe, expect, it } from "vitest";
import { createIngredientAction, deleteIngredientAction, setIngredientArchivedAction, updateIngredientAction } from "@/app/(app)/ingredients/actions";
import { deleteSupplierAction, setSupplierArchivedAction } from "@/app/(app)/suppliers/actions";
import { db } from "@/db/client";
import { recipes, recipeVersionLines, recipeVersions } from "@/db/schema";
import { getIngredientById, listIngredients, setPreferredSupplier } from "@/lib/data/ingredients";
import { createAccountWithWorkspace } from "@/lib/data/workspaces";
import { DEFAULT_INGREDIENTS } from "@/lib/formulation";
import { createTeam, signInAs, uniqueEmail, type TeamFixture } from "../support/fixtures";
import { makeIngredient, makeQuote, makeSupplier, tag } from "../support/ingredients";
import { form } from "../support/matrix";
import { freshRequest } from "../support/request";

let team: TeamFixture;
beforeEach(async () => {
  team = await createTeam("lib");
  freshRequest();
  await signInAs(team.people.formulator.id, team.workspaceId);
});

describe("a new workspace", () => {
  it("starts with the reference profiles, each with its source", async () => {
    const { workspaceId } = await createAccountWithWorkspace({
      name: "Ada Quill",
      email: uniqueEmail("signup"),
      passwordHash: "x",
      workspaceName: "Quill Cacao",
    });
    const library = await listIngredients({ workspaceId });
    expect(library.map((i) => i.referenceKey).sort()).toEqual(DEFAULT_INGREDIENTS.map((d) => d.key).sort());
    const butter = library.find((i) => i.referenceKey === "cocoa-butter");
    // USDA FoodData Central FDC 171421 (Oil, cocoa butter): fat 100 g, saturates 59.7 g.
    expect(butter).toMatchObject({ kind: "cocoa_butter", cocoaButter: "100", fat: "100", saturatedFat: "59.7" });
    expect(butter?.source).toMatch(/FDC 171421/);
    // Regulation (EU) 1169/2011 Annex II: soy lecithin carries the soybean allergen; milk powders milk.
    expect(library.find((i) => i.referenceKey === "soy-lecithin")?.allergens).toEqual(["soybeans"]);
    expect(library.find((i) => i.referenceKey === "whole-milk-powder")?.allergens).toEqual(["milk"]);
  });
});

describe("editing a profile", () => {
  const profile = { name: "Nib blend", kind: "nibs", cocoaButter: "55", cocoaSolidsNonFat: "43", moisture: "2", allergens: "", notes: "" };

  it("saves a valid profile, its remainder being 'other'", async () => {
    const r = await createIngredientAction(form({ ...profile, allergens: "nuts,milk" }));
    expect(r).toMatchObject({ ok: true });
    const saved = await getIngredientById({ workspaceId: team.workspaceId, ingredientId: r.ok ? r.data.id : "" });
    expect(saved).toMatchObject({ cocoaButter: "55", cocoaSolidsNonFat: "43", moisture: "2", sugar: "0", allergens: ["milk", "nuts"] });
  });

  it("refuses a composition over 100 g per 100 g, and fields outside 0–100, with field messages", async () => {
    const over = await createIngredientAction(form({ ...profile, sugar: "5" }));
    expect(over).toMatchObject({ ok: false, code: "invalid" });
    expect(!over.ok && over.fieldErrors?.composition?.[0]).toMatch(/adds up to 105 g per 100 g; it can be at most 100 g/);
    const bad = await createIngredientAction(form({ ...profile, cocoaButter: "120", moisture: "-1", protein: "abc" }));
    expect(!bad.ok && bad.fieldErrors).toMatchObject({
      cocoaButter: ["Cocoa butter must be at most 100."],
      moisture: [expect.stringMatching(/as a number/)],
      protein: [expect.stringMatching(/as a number/)],
    });
    expect(await listIngredients({ workspaceId: team.workspaceId })).toEqual([]);
  });

  it("refuses a second ingredient with the same name", async () => {
    await createIngredientAction(form(profile));
    expect(await createIngredientAction(form(profile))).toMatchObject({ ok: false, code: "conflict", message: expect.stringMatching(/already exists/) });
  });

  it("updates a profile in place", async () => {
    const r = await createIngredientAction(form(profile));
    const ingredientId = r.ok ? r.data.id : "";
    expect(await updateIngredientAction(form({ ...profile, ingredientId, name: "Nib blend B", cocoaButter: "54" }))).toMatchObject({ ok: true });
    expect(await getIngredientById({ workspaceId: team.workspaceId, ingredientId })).toMatchObject({ name: "Nib blend B", cocoaButter: "54" });
  });
});

describe("deleting and archiving", () => {
  async function useInRecipe(ingredientId: string, name: string) {
    const [recipe] = await db
      .insert(recipes)
      .values({ workspaceId: team.workspaceId, name, chocolateType: "dark", barMassGrams: "70" })
      .returning({ id: recipes.id });
    const [version] = await db
      .insert(recipeVersions)
      .values({ workspaceId: team.workspaceId, recipeId: recipe!.id, versionNo: 1, barMassGrams: "70", cocoaPercent: "70", evaluation: {} })
      .returning({ id: recipeVersions.id });
    await db.insert(recipeVersionLines).values({
      versionId: version!.id, position: 0, ingredientId, percent: "100", ingredientName: "x",
      cocoaButter: "0", cocoaSolidsNonFat: "0", milkFat: "0", milkSolidsNonFat: "0", sugar: "0", vegetableFat: "0", moisture: "0",
      isInclusion: false, allergens: [],
    });
  }

  it("refuses to delete an ingredient a recipe uses, naming the recipes, and archives it instead", async () => {
    const sugar = await makeIngredient(team.workspaceId);
    await useInRecipe(sugar.id, "Dark 70 demo");
    await useInRecipe(sugar.id, "Dark 82 demo");
    const refused = await deleteIngredientAction({ ingredientId: sugar.id });
    expect(refused).toMatchObject({ ok: false, code: "conflict" });
    expect(!refused.ok && refused.message).toBe(`${sugar.name} is used by the recipes Dark 70 demo and Dark 82 demo and cannot be deleted. Archive it instead.`);
    expect(await setIngredientArchivedAction({ ingredientId: sugar.id, archived: true })).toMatchObject({ ok: true });
    expect((await listIngredients({ workspaceId: team.workspaceId })).map((i) => i.id)).not.toContain(sugar.id);
    expect((await listIngredients({ workspaceId: team.workspaceId, archived: "only" })).map((i) => i.id)).toEqual([sugar.id]);
  });

  it("refuses to delete an ingredient with price history; deletes an unused one", async () => {
    const supplier = await makeSupplier(team.workspaceId);
    const priced = await makeIngredient(team.workspaceId);
    await makeQuote(team.workspaceId, team.people.buyer.id, { supplierId: supplier.id, ingredientId: priced.id, price: "2" });
    expect(await deleteIngredientAction({ ingredientId: priced.id })).toMatchObject({ ok: false, message: expect.stringMatching(/1 price quote still refer to it/) });
    const unused = await makeIngredient(team.workspaceId);
    expect(await deleteIngredientAction({ ingredientId: unused.id })).toMatchObject({ ok: true });
  });

  it("refuses to delete a supplier with quotes or preferred by an ingredient, and archives it", async () => {
    freshRequest();
    await signInAs(team.people.buyer.id, team.workspaceId);
    const supplier = await makeSupplier(team.workspaceId, { name: `Bellweather ${tag()}` });
    const butter = await makeIngredient(team.workspaceId, { name: "Butter X" });
    await setPreferredSupplier({ workspaceId: team.workspaceId, ingredientId: butter.id, supplierId: supplier.id });
    await makeQuote(team.workspaceId, team.people.buyer.id, { supplierId: supplier.id, ingredientId: butter.id, price: "19.8" });
    const refused = await deleteSupplierAction({ supplierId: supplier.id });
    expect(!refused.ok && refused.message).toBe(
      `${supplier.name} cannot be deleted: 1 price quote and the preferred-supplier choice of Butter X still refer to it. Archive it instead; its history stays.`,
    );
    expect(await setSupplierArchivedAction({ supplierId: supplier.id, archived: true })).toMatchObject({ ok: true });
  });
});
