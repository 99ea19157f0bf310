/**
 * The role × action matrix for the ingredient library, suppliers, quotes,
 * exchange rates, price-list uploads and files: every server action and route
 * handler of that feature, called as each role, signed out, and as the owner of
 * another workspace (tests/support/matrix.ts). The rights are the product's own
 * (lib/auth/permissions.ts): no outside source.
 */
import { GET as getFile } from "@/app/api/files/[fileId]/route";
import { GET as exportIngredients } from "@/app/api/ingredients/export/route";
import { DELETE as deleteIngredientFile } from "@/app/api/ingredients/[ingredientId]/files/[fileId]/route";
import { GET as listIngredientFiles, POST as uploadIngredientFile } from "@/app/api/ingredients/[ingredientId]/files/route";
import { GET as listIngredientsRoute } from "@/app/api/ingredients/route";
import { POST as previewPriceList } from "@/app/api/price-lists/preview/route";
import { GET as listPriceLists, POST as importPriceListRoute } from "@/app/api/price-lists/route";
import { GET as currentPrices } from "@/app/api/prices/current/route";
import { GET as exportQuotes } from "@/app/api/quotes/export/route";
import { GET as listQuotesRoute } from "@/app/api/quotes/route";
import { DELETE as deleteSupplierFile } from "@/app/api/suppliers/[supplierId]/files/[fileId]/route";
import { GET as listSupplierFiles, POST as uploadSupplierFile } from "@/app/api/suppliers/[supplierId]/files/route";
import { GET as listSuppliersRoute } from "@/app/api/suppliers/route";
import {
  createIngredientAction,
  deleteIngredientAction,
  setIngredientArchivedAction,
  setPreferredSupplierAction,
  updateIngredientAction,
} from "@/app/(app)/ingredients/actions";
import { deleteExchangeRateAction, saveExchangeRateAction, setBaseCurrencyAction } from "@/app/(app)/settings/currencies/actions";
import {
  createQuoteAction,
  createSupplierAction,
  deleteSupplierAction,
  setSupplierArchivedAction,
  updateSupplierAction,
} from "@/app/(app)/suppliers/actions";
import { addAttachment } from "@/lib/data/attachments";
import { saveExchangeRate } from "@/lib/data/exchange-rates";
import type { TeamFixture } from "../support/fixtures";
import { tinyPdf } from "../support/files";
import { csvFile, formRequest, makeIngredient, makeSupplier, tag } from "../support/ingredients";
import { base, form, fromResult, fromStatus, jsonRequest, params, runMatrix, type MatrixRow } from "../support/matrix";

const get = (path: string) => new Request(`${base}${path}`);
const ingredientFields = { kind: "sugar", sugar: "99.9", allergens: "" };
const supplierFields = { currency: "GBP", contactName: "", email: "", leadTimeDays: "7", notes: "" };

async function storedFile(team: TeamFixture, owner: { ingredientId: string } | { supplierId: string }) {
  return addAttachment({ workspaceId: team.workspaceId, userId: team.people.owner.id, owner, kind: "spec_sheet", fileName: "s.pdf", bytes: tinyPdf() });
}

async function priceListFor(team: TeamFixture) {
  const supplier = await makeSupplier(team.workspaceId);
  const sugar = await makeIngredient(team.workspaceId);
  return { supplierId: supplier.id, file: csvFile(`Ingredient,Price,Valid from\n${sugar.name},1.5,2026-03-01\n`) };
}

const rows: MatrixRow[] = [
  // Server actions.
  {
    name: "createIngredientAction",
    permission: "ingredients.edit",
    outsider: "ok", // creates in the outsider's own workspace
    run: async () => fromResult(await createIngredientAction(form({ name: `Sugar ${tag()}`, ...ingredientFields }))),
  },
  {
    name: "updateIngredientAction",
    permission: "ingredients.edit",
    outsider: "not_found",
    run: async ({ team }) => {
      const i = await makeIngredient(team.workspaceId);
      return fromResult(await updateIngredientAction(form({ ingredientId: i.id, name: `Sugar ${tag()}`, ...ingredientFields })));
    },
  },
  {
    name: "setIngredientArchivedAction",
    permission: "ingredients.edit",
    outsider: "not_found",
    run: async ({ team }) => fromResult(await setIngredientArchivedAction({ ingredientId: (await makeIngredient(team.workspaceId)).id, archived: true })),
  },
  {
    name: "deleteIngredientAction",
    permission: "ingredients.edit",
    outsider: "not_found",
    run: async ({ team }) => fromResult(await deleteIngredientAction({ ingredientId: (await makeIngredient(team.workspaceId)).id })),
  },
  {
    name: "setPreferredSupplierAction",
    permission: "suppliers.edit",
    outsider: "not_found",
    run: async ({ team }) => {
      const [i, s] = [await makeIngredient(team.workspaceId), await makeSupplier(team.workspaceId)];
      return fromResult(await setPreferredSupplierAction({ ingredientId: i.id, supplierId: s.id }));
    },
  },
  {
    name: "createSupplierAction",
    permission: "suppliers.edit",
    outsider: "ok",
    run: async () => fromResult(await createSupplierAction(form({ name: `Tallis ${tag()}`, ...supplierFields }))),
  },
  {
    name: "updateSupplierAction",
    permission: "suppliers.edit",
    outsider: "not_found",
    run: async ({ team }) => {
      const s = await makeSupplier(team.workspaceId);
      return fromResult(await updateSupplierAction(form({ supplierId: s.id, name: `Tallis ${tag()}`, ...supplierFields })));
    },
  },
  {
    name: "setSupplierArchivedAction",
    permission: "suppliers.edit",
    outsider: "not_found",
    run: async ({ team }) => fromResult(await setSupplierArchivedAction({ supplierId: (await makeSupplier(team.workspaceId)).id, archived: true })),
  },
  {
    name: "deleteSupplierAction",
    permission: "suppliers.edit",
    outsider: "not_found",
    run: async ({ team }) => fromResult(await deleteSupplierAction({ supplierId: (await makeSupplier(team.workspaceId)).id })),
  },
  {
    name: "createQuoteAction",
    permission: "suppliers.edit",
    outsider: "not_found", // our supplier and ingredient are not found from another workspace
    run: async ({ team }) => {
      const [i, s] = [await makeIngredient(team.workspaceId), await makeSupplier(team.workspaceId)];
      return fromResult(
        await createQuoteAction(form({ supplierId: s.id, ingredientId: i.id, price: "1.25", currency: "EUR", unit: "per_kg", packKg: "", minimumOrderKg: "", validFrom: "2026-03-01", validUntil: "" })),
      );
    },
  },
  {
    name: "saveExchangeRateAction",
    permission: "suppliers.edit",
    outsider: "ok",
    run: async () => fromResult(await saveExchangeRateAction(form({ currency: "USD", rateToBase: "0.92", validOn: "2026-10-01" }))),
  },
  {
    name: "deleteExchangeRateAction",
    permission: "suppliers.edit",
    outsider: "not_found",
    run: async ({ team }) => {
      const { id } = await saveExchangeRate({ workspaceId: team.workspaceId, userId: team.people.owner.id, input: { currency: "GBP", rateToBase: "1.15", validOn: `2026-0${1 + (Math.random() * 8) | 0}-1${(Math.random() * 9) | 0}` } });
      return fromResult(await deleteExchangeRateAction({ rateId: id }));
    },
  },
  {
    name: "setBaseCurrencyAction (to the current base)",
    permission: "suppliers.edit",
    outsider: "ok",
    run: async () => fromResult(await setBaseCurrencyAction(form({ baseCurrency: "EUR" }))),
  },
  // Route handlers.
  { name: "GET /api/ingredients", permission: "ingredients.read", outsider: "ok", run: async () => fromStatus((await listIngredientsRoute(get("/api/ingredients"), params())).status) },
  { name: "GET /api/ingredients/export", permission: "ingredients.read", outsider: "ok", run: async () => fromStatus((await exportIngredients(get("/api/ingredients/export"), params())).status) },
  {
    name: "GET /api/ingredients/:ingredientId/files",
    permission: "ingredients.read",
    outsider: "not_found",
    run: async ({ team }) => {
      const ingredientId = (await makeIngredient(team.workspaceId)).id;
      return fromStatus((await listIngredientFiles(get(`/api/ingredients/${ingredientId}/files`), params({ ingredientId }))).status);
    },
  },
  {
    name: "POST /api/ingredients/:ingredientId/files",
    permission: "ingredients.edit",
    outsider: "not_found",
    run: async ({ team }) => {
      const ingredientId = (await makeIngredient(team.workspaceId)).id;
      const req = formRequest(`/api/ingredients/${ingredientId}/files`, { file: new File([new Uint8Array(tinyPdf())], "spec.pdf") });
      return fromStatus((await uploadIngredientFile(req, params({ ingredientId }))).status);
    },
  },
  {
    name: "DELETE /api/ingredients/:ingredientId/files/:fileId",
    permission: "ingredients.edit",
    outsider: "not_found",
    run: async ({ team }) => {
      const ingredientId = (await makeIngredient(team.workspaceId)).id;
      const { id: fileId } = await storedFile(team, { ingredientId });
      return fromStatus((await deleteIngredientFile(jsonRequest("DELETE", `/api/ingredients/${ingredientId}/files/${fileId}`), params({ ingredientId, fileId }))).status);
    },
  },
  { name: "GET /api/suppliers", permission: "ingredients.read", outsider: "ok", run: async () => fromStatus((await listSuppliersRoute(get("/api/suppliers"), params())).status) },
  {
    name: "GET /api/suppliers/:supplierId/files",
    permission: "ingredients.read",
    outsider: "not_found",
    run: async ({ team }) => {
      const supplierId = (await makeSupplier(team.workspaceId)).id;
      return fromStatus((await listSupplierFiles(get(`/api/suppliers/${supplierId}/files`), params({ supplierId }))).status);
    },
  },
  {
    name: "POST /api/suppliers/:supplierId/files",
    permission: "suppliers.edit",
    outsider: "not_found",
    run: async ({ team }) => {
      const supplierId = (await makeSupplier(team.workspaceId)).id;
      const req = formRequest(`/api/suppliers/${supplierId}/files`, { file: new File([new Uint8Array(tinyPdf())], "cert.pdf"), kind: "certificate" });
      return fromStatus((await uploadSupplierFile(req, params({ supplierId }))).status);
    },
  },
  {
    name: "DELETE /api/suppliers/:supplierId/files/:fileId",
    permission: "suppliers.edit",
    outsider: "not_found",
    run: async ({ team }) => {
      const supplierId = (await makeSupplier(team.workspaceId)).id;
      const { id: fileId } = await storedFile(team, { supplierId });
      return fromStatus((await deleteSupplierFile(jsonRequest("DELETE", `/api/suppliers/${supplierId}/files/${fileId}`), params({ supplierId, fileId }))).status);
    },
  },
  {
    name: "GET /api/files/:fileId",
    permission: "ingredients.read",
    outsider: "not_found",
    run: async ({ team }) => {
      const { id: fileId } = await storedFile(team, { ingredientId: (await makeIngredient(team.workspaceId)).id });
      return fromStatus((await getFile(get(`/api/files/${fileId}`), params({ fileId }))).status);
    },
  },
  // Quotes and current prices are money: costs.read while the owner has not shared costs (lib/auth/costs.ts;
  // the shared case is in matrix-cost-visibility.test.ts). Product rule, no outside source.
  { name: "GET /api/quotes", permission: "costs.read", outsider: "ok", run: async () => fromStatus((await listQuotesRoute(get("/api/quotes"), params())).status) },
  { name: "GET /api/quotes/export", permission: "costs.read", outsider: "ok", run: async () => fromStatus((await exportQuotes(get("/api/quotes/export"), params())).status) },
  {
    name: "POST /api/price-lists/preview",
    permission: "suppliers.edit",
    outsider: "not_found", // our supplier is not found from another workspace
    run: async ({ team }) => fromStatus((await previewPriceList(formRequest("/api/price-lists/preview", await priceListFor(team)), params())).status),
  },
  {
    name: "POST /api/price-lists",
    permission: "suppliers.edit",
    outsider: "not_found",
    run: async ({ team }) => fromStatus((await importPriceListRoute(formRequest("/api/price-lists", await priceListFor(team)), params())).status),
  },
  { name: "GET /api/price-lists", permission: "ingredients.read", outsider: "ok", run: async () => fromStatus((await listPriceLists(get("/api/price-lists"), params())).status) },
  {
    name: "GET /api/prices/current",
    permission: "costs.read",
    outsider: "ok", // answers "unknown_ingredient" for ids of another workspace (tests/integration/quotes.test.ts)
    run: async ({ team }) => {
      const id = (await makeIngredient(team.workspaceId)).id;
      return fromStatus((await currentPrices(get(`/api/prices/current?ingredientIds=${id}`), params())).status);
    },
  },
];

runMatrix("ingredients", rows);
