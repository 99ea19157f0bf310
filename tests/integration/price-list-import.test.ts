import iconv from "iconv-lite";
import { beforeEach, describe, expect, it } from "vitest";
import { POST as previewRoute } from "@/app/api/price-lists/preview/route";
import { GET as listImportsRoute, POST as importRoute } from "@/app/api/price-lists/route";
import { listQuotes } from "@/lib/data/quotes";
import { MAX_PRICE_LIST_ROWS } from "@/lib/price-lists/limits";
import { createTeam, signInAs, type TeamFixture } from "../support/fixtures";
import { csvFile, formRequest, makeIngredient, makeSupplier } from "../support/ingredients";
import { base, params } from "../support/matrix";
import { freshRequest } from "../support/request";

let team: TeamFixture;
let supplierId: string;

beforeEach(async () => {
  team = await createTeam("plist");
  supplierId = (await makeSupplier(team.workspaceId, { name: "Saltmarsh Sugar Company", currency: "GBP" })).id;
  await makeIngredient(team.workspaceId, { name: "Sugar (sucrose)" });
  await makeIngredient(team.workspaceId, { name: "Crème fraîche powder", kind: "milk_powder", sugar: "0", milkFat: "40", milkSolidsNonFat: "57" });
  freshRequest();
  await signInAs(team.people.buyer.id, team.workspaceId);
});

type Body = Record<string, unknown> & { error?: { message: string }; rows?: Array<{ rowNumber: number; status: string; reasons: string[] }> };

async function post(route: typeof previewRoute, path: string, file: File, extra: Record<string, string> = {}) {
  const res = await route(formRequest(path, { supplierId, file, ...extra }), params());
  return { status: res.status, body: (await res.json()) as Body };
}
const preview = (file: File, extra?: Record<string, string>) => post(previewRoute, "/api/price-lists/preview", file, extra);
const upload = (file: File, extra?: Record<string, string>) => post(importRoute, "/api/price-lists", file, extra);
const quoteCount = async () => (await listQuotes({ workspaceId: team.workspaceId, on: "2026-12-01" })).quotes.length;

const GOOD = [
  "Product,Price,Currency,Unit,Pack size,Valid from",
  "Sugar (sucrose),985,GBP,per tonne,,2026-10-10",
  "sugar  (SUCROSE),28.50,GBP,bag,25,2026-07-01",
  "Crème fraîche powder,4.10,EUR,kg,,2026-09-01",
].join("\r\n");

describe("a good price list", () => {
  it("is previewed with a guessed mapping, then imported in one go", async () => {
    const checked = await preview(csvFile(GOOD));
    expect(checked.status).toBe(200);
    expect(checked.body.mapping).toEqual({ ingredient: 0, price: 1, currency: 2, unit: 3, packKg: 4, minimumOrderKg: null, validFrom: 5, validUntil: null });
    expect(checked.body.counts).toEqual({ new: 3, already_imported: 0, duplicate_in_file: 0, invalid: 0 });
    expect(await quoteCount()).toBe(0); // the preview writes nothing

    const done = await upload(csvFile(GOOD));
    expect(done.status).toBe(200);
    expect(done.body).toMatchObject({ imported: 3, duplicates: 0, invalid: 0 });
    const { quotes } = await listQuotes({ workspaceId: team.workspaceId, on: "2026-12-01" });
    expect(quotes.map((q) => [q.ingredientName, q.price, q.currency, q.unit, q.packKg]).sort()).toEqual([
      ["Crème fraîche powder", "4.1", "EUR", "per_kg", null],
      ["Sugar (sucrose)", "28.5", "GBP", "per_pack", "25"],
      ["Sugar (sucrose)", "985", "GBP", "per_tonne", null],
    ]);
    expect(quotes.every((q) => q.source === `price-list:${done.body.importId}`)).toBe(true);
    const history = await listImportsRoute(new Request(`${base}/api/price-lists`), params());
    expect(((await history.json()) as { imports: unknown[] }).imports).toEqual([
      expect.objectContaining({ fileName: "prices.csv", importedCount: 3, rowCount: 3, encoding: "UTF-8" }),
    ]);
  });

  it("reads semicolons, decimal commas, day-first dates and Windows-1252 text with the chosen options", async () => {
    const text = "Artikel;Preis;Einheit;Gültig ab;Notiz\nCrème fraîche powder;4,25;kg;01.09.2026;“neu” €\nSugar (sucrose);1.020,00;t;15.10.2026;\n";
    const file = csvFile(iconv.encode(text, "windows-1252"), "liste.csv");
    const mapping = JSON.stringify({ ingredient: 0, price: 1, currency: null, unit: 2, packKg: null, minimumOrderKg: null, validFrom: 3, validUntil: null });
    const done = await upload(file, { mapping, decimalSeparator: ",", dateFormat: "DD.MM.YYYY" });
    expect(done.status).toBe(200);
    expect(done.body).toMatchObject({ imported: 2, check: { encoding: "windows-1252", delimiter: ";" } });
    const { quotes } = await listQuotes({ workspaceId: team.workspaceId, on: "2026-12-01" });
    expect(quotes.map((q) => [q.ingredientName, q.price, q.currency, q.validFrom]).sort()).toEqual([
      ["Crème fraîche powder", "4.25", "GBP", "2026-09-01"],
      ["Sugar (sucrose)", "1020", "GBP", "2026-10-15"],
    ]);
  });
});

describe("a price list with bad rows", () => {
  const BAD = [
    "Ingredient,Price,Unit,Pack kg,Valid from,Valid until",
    "Sugar (sucrose),0.99,kg,,2026-03-01,",
    "Unicorn dust,12,kg,,2026-03-01,",
    "Sugar (sucrose),twelve,kg,,2026-03-01,",
    "Sugar (sucrose),30,pack,,2026-03-01,",
    "Sugar (sucrose),1.1,kg,,2026-05-01,2026-04-01",
    "Sugar (sucrose),1.2,litre,,31/02/2026,",
    "",
    "Sugar (sucrose),1.3,kg,,2026-06-01,",
  ].join("\n");

  it("lists every bad row with its number and reasons, and imports only the valid rows", async () => {
    const checked = await preview(csvFile(BAD));
    const byRow = Object.fromEntries((checked.body.rows ?? []).map((r) => [r.rowNumber, r]));
    expect(byRow[2]).toMatchObject({ status: "new" });
    expect(byRow[3]?.reasons).toEqual([expect.stringMatching(/^Ingredient: no ingredient called “Unicorn dust”/)]);
    expect(byRow[4]?.reasons).toEqual([expect.stringMatching(/^Price: Enter the price as a number/)]);
    expect(byRow[5]?.reasons).toEqual(["Pack size (kg): A per-pack price needs the pack size in kg."]);
    expect(byRow[6]?.reasons).toEqual(["Valid until: “Valid until” must be on or after “valid from”."]);
    expect(byRow[7]?.reasons).toEqual([
      expect.stringMatching(/^Unit: “litre” is not a unit we know/),
      "Valid from: “31/02/2026” is not a date written as YYYY-MM-DD.",
    ]);
    // The blank row 8 is skipped but keeps the numbering of a spreadsheet.
    expect(byRow[9]).toMatchObject({ status: "new" });
    expect(checked.body.counts).toEqual({ new: 2, already_imported: 0, duplicate_in_file: 0, invalid: 5 });

    const done = await upload(csvFile(BAD));
    expect(done.body).toMatchObject({ imported: 2, invalid: 5 });
    expect(await quoteCount()).toBe(2);
  });

  it("refuses a file in which no row can be imported, writing nothing", async () => {
    const done = await upload(csvFile("Ingredient,Price\nUnicorn dust,3\n"));
    expect(done.status).toBe(422);
    expect(done.body.error?.message).toMatch(/No row of this file can be imported/);
    expect(await quoteCount()).toBe(0);
  });
});

describe("uploading the same price list again", () => {
  it("adds no quote twice, and says the rows were already recorded", async () => {
    await upload(csvFile(GOOD));
    const again = await upload(csvFile(GOOD));
    expect(again.body).toMatchObject({ imported: 0, duplicates: 3 });
    expect(again.body.check).toMatchObject({ counts: { already_imported: 3, new: 0 }, sameFileImportedAt: expect.any(String) });
    expect(await quoteCount()).toBe(3);
  });

  it("imports a row repeated inside one file once", async () => {
    const text = "Ingredient,Price,Valid from\nSugar (sucrose),1.5,2026-03-01\nSugar (sucrose),1.50,2026-03-01\n";
    const checked = await preview(csvFile(text));
    expect(checked.body.rows?.[1]).toMatchObject({ status: "duplicate_in_file", reasons: ["The same quote as row 2."] });
    expect((await upload(csvFile(text))).body).toMatchObject({ imported: 1, duplicates: 1 });
  });
});

describe("a file that is not a usable CSV", () => {
  it.each([
    ["a PDF", new Uint8Array([...Buffer.from("%PDF-1.7\n%âãÏÓ\n1 0 obj\n<<>>\nendobj\n")]), /That is a PDF file, not a CSV file/],
    ["a spreadsheet workbook", new Uint8Array([0x50, 0x4b, 0x03, 0x04, ...Buffer.from("[Content_Types].xml"), ...new Array(200).fill(0)]), /spreadsheet workbook|not a CSV file/],
    ["binary data", new Uint8Array([1, 2, 0, 3, 4, 0, 5]), /not text/],
    ["an empty file", new Uint8Array([]), /empty/],
    ["a single column", new Uint8Array(Buffer.from("just one column\nsugar\n")), /only one column/],
  ])("refuses %s with a clear message", async (_label, bytes, message) => {
    const res = await preview(csvFile(bytes, "prices.csv"));
    expect(res.status).toBe(422);
    expect(res.body.error?.message).toMatch(message);
  });

  it("refuses a file over the size cap and one over the row cap", async () => {
    const big = await preview(csvFile("Ingredient,Price\n" + "Sugar (sucrose),1\n".repeat(130_000)));
    // Refused while the body is read (apiRoute counts the bytes), before any parsing.
    expect(big.status).toBe(413);
    expect(big.body.error?.message).toMatch(/larger than 2 MB/);
    const long = await preview(csvFile("Ingredient,Price\n" + "Sugar (sucrose),1\n".repeat(MAX_PRICE_LIST_ROWS + 1)));
    expect(long.body.error?.message).toMatch(new RegExp(`more than ${MAX_PRICE_LIST_ROWS} rows`));
  });

  it("previews a mapping without the price column without judging rows, and refuses to import it", async () => {
    const mapping = JSON.stringify({ ingredient: 0, price: null, currency: null, unit: null, packKg: null, minimumOrderKg: null, validFrom: null, validUntil: null });
    const res = await preview(csvFile(GOOD), { mapping });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ mappingProblems: { price: "Choose the column with the prices." }, rows: [], rowCount: 3 });
    const done = await upload(csvFile(GOOD), { mapping });
    expect(done.status).toBe(422);
    expect(done.body.error?.message).toBe("Choose the column with the prices.");
    expect(await quoteCount()).toBe(0);
  });

  it("refuses a column mapped to two fields", async () => {
    const mapping = JSON.stringify({ ingredient: 0, price: 0, currency: null, unit: null, packKg: null, minimumOrderKg: null, validFrom: null, validUntil: null });
    const res = await preview(csvFile(GOOD), { mapping });
    expect(res.status).toBe(422);
    expect(JSON.stringify(res.body)).toMatch(/already mapped to “Ingredient”/);
  });
});
