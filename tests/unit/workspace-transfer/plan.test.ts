import { describe, expect, it } from "vitest";
import type { ExportDocument, Row } from "@/lib/workspace-transfer/format";
import { planImport } from "@/lib/workspace-transfer/plan";
import { quoteDedupeKey } from "@/lib/pricing/dedupe-key";
import { EXPORTED_TABLES } from "@/lib/workspace-transfer/tables";

const OLD_WS = "00000000-0000-4000-8000-000000000001";
const NEW_WS = "00000000-0000-4000-8000-0000000000ff";
const MARA = "00000000-0000-4000-8000-00000000000a";
const THEO = "00000000-0000-4000-8000-00000000000b";
const importer = { id: "00000000-0000-4000-8000-0000000000aa", email: "Mara@fenwicklane.example" };
const id = (n: number) => `00000000-0000-4000-8000-1000000000${String(n).padStart(2, "0")}`;

function doc(tables: Record<string, Row[]>): ExportDocument {
  return {
    format: "barwright-workspace",
    schemaVersion: 1,
    exportedAt: "2026-12-02T00:00:00.000Z",
    workspace: { id: OLD_WS, name: "Fenwick Lane Chocolate Works", baseCurrency: "EUR", createdAt: new Date("2026-01-01") },
    people: [
      { id: MARA, name: "Mara Ellison", email: "mara@fenwicklane.example", role: "owner" },
      { id: THEO, name: "Theo Brandt", email: "theo@fenwicklane.example", role: "formulator" },
    ],
    tables: Object.fromEntries(EXPORTED_TABLES.map((t) => [t.name, tables[t.name] ?? []])) as ExportDocument["tables"],
    files: [],
  };
}

const quote = { id: id(3), workspaceId: OLD_WS, supplierId: id(1), ingredientId: id(2), price: "1.25", currency: "EUR", unit: "per_kg", packKg: null, minimumOrderKg: null, validFrom: "2026-03-01", validUntil: null, source: `price-list:${id(4)}`, dedupeKey: "old", createdById: THEO };
const base = {
  suppliers: [{ id: id(1), workspaceId: OLD_WS, name: "Saltmarsh Sugar Company" }],
  ingredients: [{ id: id(2), workspaceId: OLD_WS, name: "Cane sugar", preferredSupplierId: id(1) }],
  price_list_imports: [{ id: id(4), workspaceId: OLD_WS, supplierId: id(1), createdById: MARA }],
  price_quotes: [quote],
  recipes: [
    { id: id(5), workspaceId: OLD_WS, name: "Dark 70", copiedFromRecipeId: null, createdById: MARA },
    { id: id(6), workspaceId: OLD_WS, name: "Dark 70 copy", copiedFromRecipeId: id(5), createdById: THEO },
  ],
};
const on = new Date("2026-12-02T10:00:00Z");
const rowsOf = (plan: ReturnType<typeof planImport>, name: string) => plan.tables.find((t) => t.table.name === name)!.rows;

describe("planImport", () => {
  const plan = planImport(doc(base), { importer, workspaceId: NEW_WS, on });

  it("names the new workspace after the old one and the day, keeping its settings", () => {
    expect(plan.workspace).toEqual({ name: "Fenwick Lane Chocolate Works (imported 2 Dec 2026)", baseCurrency: "EUR" });
  });

  it("gives every row a new id and follows foreign keys and soft references through the same map", () => {
    const [supplier] = rowsOf(plan, "suppliers");
    const [ingredient] = rowsOf(plan, "ingredients");
    const [original, copy] = rowsOf(plan, "recipes");
    expect(supplier!.id).not.toBe(id(1));
    expect(ingredient!.preferredSupplierId).toBe(supplier!.id);
    expect(copy!.copiedFromRecipeId).toBe(original!.id);
    expect(supplier!.workspaceId).toBe(NEW_WS);
  });

  it("points author columns at the importer when the person is the importer (e-mail, any case), else clears them", () => {
    const [original, copy] = rowsOf(plan, "recipes");
    expect(original!.createdById).toBe(importer.id);
    expect(copy!.createdById).toBeNull();
    expect(plan.skippedPeople.map((p) => p.email)).toEqual(["theo@fenwicklane.example"]);
  });

  it("rewrites a quote's price-list source and recomputes its dedupe key from the new ids", () => {
    const [q] = rowsOf(plan, "price_quotes");
    const [upload] = rowsOf(plan, "price_list_imports");
    expect(q!.source).toBe(`price-list:${upload!.id}`);
    expect(q!.dedupeKey).toBe(quoteDedupeKey(q as never));
    expect(q!.dedupeKey).not.toBe(quoteDedupeKey({ ...quote }));
  });

  it("refuses a reference to a row that is not in the file, and a duplicated id", () => {
    const broken = { ...base, recipes: [{ ...base.recipes[1]!, copiedFromRecipeId: id(99) }] };
    expect(() => planImport(doc(broken), { importer, workspaceId: NEW_WS, on })).toThrow(/recipes row 1 \(copiedFromRecipeId\) points at a row of recipes that is not in the file/);
    const twice = { ...base, suppliers: [...base.suppliers, ...base.suppliers] };
    expect(() => planImport(doc(twice), { importer, workspaceId: NEW_WS, on })).toThrow(/suppliers: the id .* appears twice/);
    const orphanSource = { ...base, price_list_imports: [] };
    expect(() => planImport(doc(orphanSource), { importer, workspaceId: NEW_WS, on })).toThrow(/price_quotes row 1: its source names a price-list upload that is not in the file/);
  });
});
