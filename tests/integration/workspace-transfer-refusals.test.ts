import { count } from "drizzle-orm";
import { beforeAll, beforeEach, describe, expect, it } from "vitest";
import { db } from "@/db/client";
import { workspaces } from "@/db/schema";
import { MAX_IMPORT_BYTES } from "@/lib/workspace-transfer/format";
import { POST as importRoute } from "@/app/api/workspace/import/route";
import { exportWorkspace } from "@/lib/workspace-transfer/export";
import { readExportDocument } from "@/lib/workspace-transfer/read-document";
import { createTeam, signInAs, type TeamFixture } from "../support/fixtures";
import { makeIngredient, makeSupplier } from "../support/ingredients";
import { darkRecipe } from "../support/recipe-fixtures";
import { base, params } from "../support/matrix";
import { freshRequest } from "../support/request";
import { uploadExport, type Doc } from "../support/workspace-transfer";

let team: TeamFixture;
let valid: string;

beforeAll(async () => {
  team = await createTeam("refuse");
  await makeSupplier(team.workspaceId, { name: "Saltmarsh Sugar Company" });
  await makeSupplier(team.workspaceId, { name: "Tallis Fine Ingredients" });
  await makeIngredient(team.workspaceId);
  await darkRecipe(team);
  valid = await exportWorkspace({ workspaceId: team.workspaceId, includeFiles: true });
});

beforeEach(async () => {
  freshRequest();
  await signInAs(team.people.owner.id, team.workspaceId);
});

const workspaceCount = async () => (await db.select({ n: count() }).from(workspaces))[0]!.n;
const edited = (change: (doc: Doc) => void) => {
  const doc = JSON.parse(valid) as Doc;
  change(doc);
  return JSON.stringify(doc);
};

/** Uploads a file and expects a 422 with a message matching `message`, and no workspace created. */
async function expectRefused(content: string | Uint8Array, message: RegExp) {
  const before = await workspaceCount();
  const res = await uploadExport(content);
  expect(res.status).toBe(422);
  expect((res.body.error as { message: string }).message).toMatch(message);
  expect(await workspaceCount()).toBe(before);
}

describe("importing a file that is not a usable export", () => {
  it("accepts the untouched export (the baseline the refusals edit)", async () => {
    const res = await uploadExport(valid);
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ name: expect.stringMatching(/^refuse works \(imported /), files: 0, skippedPeople: expect.any(Array) });
  });

  it("refuses an empty file, text that is not JSON, and JSON of another kind", async () => {
    await expectRefused("", /empty/);
    await expectRefused("name,kind\nSugar,sugar\n", /not JSON text/);
    await expectRefused(JSON.stringify({ hello: "world" }), /not a Barwright workspace export/);
    await expectRefused(JSON.stringify([1, 2, 3]), /not a Barwright workspace export/);
  });

  it("refuses a file from a newer Barwright, and one whose format version is no longer read", async () => {
    await expectRefused(edited((d) => Object.assign(d, { schemaVersion: 2 })), /newer Barwright \(format version 2; this server reads version 1\)/);
    await expectRefused(edited((d) => Object.assign(d, { schemaVersion: 0 })), /format version 0, which this Barwright no longer reads/);
    await expectRefused(edited((d) => Object.assign(d, { schemaVersion: "1" })), /does not say which version/);
  });

  it("refuses a row of the wrong shape, naming the table, row and column", async () => {
    await expectRefused(edited((d) => Object.assign(d.tables.suppliers![1]!, { name: 42 })), /suppliers › row 2 › name: .*expected string/i);
    await expectRefused(edited((d) => Object.assign(d.tables.recipes![0]!, { colour: "brown" })), /recipes › row 1/);
    await expectRefused(edited((d) => delete (d.tables as Record<string, unknown>).machines), /machines/);
    await expectRefused(edited((d) => Object.assign(d.tables.ingredients![0]!, { sugar: "12345.5" })), /ingredients › row 1 › sugar: Too many digits/);
    const deep = "[".repeat(200_000) + "]".repeat(200_000);
    await expectRefused(edited((d) => Object.assign(d.tables.recipe_versions![0]!, { evaluation: "DEEP" })).replace('"DEEP"', deep), /nests values far deeper than an export does/);
  });

  it("refuses a broken reference between rows, and rows of another workspace", async () => {
    const stranger = "4f0c2a8e-6d1b-4c9a-9e3f-1a2b3c4d5e6f";
    await expectRefused(edited((d) => Object.assign(d.tables.recipe_version_lines![0]!, { ingredientId: stranger })), /recipe_version_lines row 1 \(ingredientId\) points at a row of ingredients that is not in the file/);
    await expectRefused(edited((d) => Object.assign(d.tables.recipes![0]!, { createdById: stranger })), /names a person who is not in the file/);
    await expectRefused(edited((d) => Object.assign(d.tables.suppliers![0]!, { workspaceId: stranger })), /suppliers row 1 belongs to another workspace/);
  });

  it("refuses rows that break a database rule, leaving nothing half-imported", async () => {
    // Two suppliers of one name: valid rows each, refused together by the unique constraint.
    await expectRefused(edited((d) => Object.assign(d.tables.suppliers![1]!, { name: d.tables.suppliers![0]!.name })), /break a rule of the database \(suppliers_workspace_name\)/);
  });

  it("refuses a file over the size limit: by its declared length before reading, and by its bytes", async () => {
    const before = await workspaceCount();
    const request = new Request(`${base}/api/workspace/import`, {
      method: "POST",
      headers: { origin: base, host: "127.0.0.1:3000", "sec-fetch-site": "same-origin", "content-length": String(MAX_IMPORT_BYTES + 100_000), "content-type": "multipart/form-data; boundary=x" },
      body: "--x--",
    });
    const res = await importRoute(request, params());
    expect(res.status).toBe(413);
    expect(((await res.json()) as { error: { message: string } }).error.message).toMatch(/larger than \d+ MB\. Nothing was saved/);
    expect(() => readExportDocument(new Uint8Array(MAX_IMPORT_BYTES + 1))).toThrow(/larger than 50 MB\. Download the export again without files/);
    expect(await workspaceCount()).toBe(before);
  });
});
