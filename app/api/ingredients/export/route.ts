import { apiRoute } from "@/lib/api/route";
import { toCsv, csvResponse } from "@/lib/csv/export";
import { listIngredients } from "@/lib/data/ingredients";
import { COMPOSITION_FIELDS, KIND_LABELS, NUTRIENT_FIELDS } from "@/lib/ingredients/kinds";
import { ingredientListQuerySchema } from "@/lib/validation/ingredients";
import type { IngredientRecord } from "@/lib/data/ingredients";

const columns = [
  { header: "Name", value: (i: IngredientRecord) => i.name },
  { header: "Kind", value: (i: IngredientRecord) => KIND_LABELS[i.kind] },
  ...COMPOSITION_FIELDS.map((f) => ({ header: `${f.label} (g/100 g)`, value: (i: IngredientRecord) => i[f.key] })),
  { header: "Inclusion", value: (i: IngredientRecord) => (i.isInclusion ? "yes" : "no") },
  ...NUTRIENT_FIELDS.map((f) => ({ header: `${f.label} (g/100 g)`, value: (i: IngredientRecord) => i[f.key] })),
  { header: "Allergens (EU 1169/2011 Annex II)", value: (i: IngredientRecord) => i.allergens.join("; ") },
  { header: "Preferred supplier", value: (i: IngredientRecord) => i.preferredSupplierName },
  { header: "Source", value: (i: IngredientRecord) => i.source },
  { header: "Notes", value: (i: IngredientRecord) => i.notes },
  { header: "Archived", value: (i: IngredientRecord) => (i.archived ? "yes" : "no") },
];

/** GET /api/ingredients/export — the library as CSV, safe to open in a spreadsheet. */
export const GET = apiRoute({
  permission: "ingredients.read",
  schema: ingredientListQuerySchema,
  handler: async ({ input, viewer }) => {
    const list = await listIngredients({ workspaceId: viewer.workspace.id, archived: input.archived });
    return csvResponse(toCsv(columns, list), "ingredients.csv");
  },
});
