import { eq } from "drizzle-orm";
import { beforeAll, beforeEach, describe, expect, it } from "vitest";
import { switchWorkspaceAction } from "@/app/(app)/actions";
import { db } from "@/db/client";
import { memberships, users, workspaces } from "@/db/schema";
import { DEMO_PEOPLE, seedDemo } from "@/db/seed";
import { getViewer } from "@/lib/auth/current";
import { importWorkspace, type ImportResult } from "@/lib/workspace-transfer/import";
import { EXPORTED_TABLES } from "@/lib/workspace-transfer/tables";
import { signInAs } from "../support/fixtures";
import { freshRequest } from "../support/request";
import { downloadExport, expectSameContent, type Doc } from "../support/workspace-transfer";

const owner = DEMO_PEOPLE.find((p) => p.role === "owner")!;
let demoId: string;
let ownerId: string;
let firstText: string;
let first: Doc;
let imported: ImportResult;

beforeAll(async () => {
  demoId = (await seedDemo(db)).workspaceId;
  ownerId = (await db.select({ id: users.id }).from(users).where(eq(users.email, owner.email)))[0]!.id;
  freshRequest();
  await signInAs(ownerId, demoId);
  const download = await downloadExport();
  expect(download.status).toBe(200);
  expect(download.headers.get("content-disposition")).toMatch(/^attachment; filename="barwright-fenwick-lane-chocolate-works-\d{4}-\d{2}-\d{2}\.json"$/);
  firstText = download.text;
  first = JSON.parse(firstText) as Doc;
  imported = await importWorkspace({ bytes: new TextEncoder().encode(firstText), importer: { id: ownerId, email: owner.email } });
});

beforeEach(() => freshRequest());

const asMaps = (maps: ImportResult["idMaps"]) => Object.fromEntries(Object.entries(maps).map(([t, m]) => [t, Object.fromEntries(m)]));

describe("exporting the demo workspace", () => {
  it("writes our format with its schema version and every exported table, the demo's main ones filled", () => {
    expect(first).toMatchObject({ format: "barwright-workspace", schemaVersion: 1 });
    expect(Object.keys(first.tables).sort()).toEqual(EXPORTED_TABLES.map((t) => t.name).sort());
    for (const name of ["suppliers", "ingredients", "price_quotes", "recipes", "recipe_versions", "recipe_version_lines", "recipe_releases", "bean_lots", "processing_records", "roast_presets", "machines", "batches", "batch_lines", "recipe_cost_settings", "recipe_labels"]) {
      expect(first.tables[name]!.length, name).toBeGreaterThan(0);
    }
    expect(first.files.length).toBe(first.tables.attachments!.length);
  });

  it("lists the people with names, e-mails and roles, never password hashes or tokens", () => {
    expect(first.people.filter((p) => p.role !== null).map((p) => [p.email, p.role]).sort()).toEqual(DEMO_PEOPLE.map((p) => [p.email, p.role]).sort());
    for (const person of first.people) expect(Object.keys(person).sort()).toEqual(["email", "id", "name", "role"]);
    expect(firstText).not.toMatch(/passwordHash|password_hash|tokenHash|\$argon2/);
  });
});

describe("importing the demo export", () => {
  it("makes a new workspace named after the old one, owned by the importer alone", async () => {
    const [ws] = await db.select().from(workspaces).where(eq(workspaces.id, imported.workspaceId));
    expect(ws?.name).toMatch(/^Fenwick Lane Chocolate Works \(imported \d{1,2} [A-Z][a-z]{2} \d{4}\)$/);
    expect(ws?.baseCurrency).toBe(first.workspace.baseCurrency);
    const members = await db.select().from(memberships).where(eq(memberships.workspaceId, imported.workspaceId));
    expect(members.map((m) => [m.userId, m.role])).toEqual([[ownerId, "owner"]]);
    expect(imported.skippedPeople.map((p) => p.email).sort()).toEqual(DEMO_PEOPLE.filter((p) => p.role !== "owner").map((p) => p.email).sort());
  });

  it("re-exports with every row of every table equal once ids are mapped", async () => {
    await signInAs(ownerId, imported.workspaceId);
    const again = await downloadExport();
    const second = JSON.parse(again.text) as Doc;
    expectSameContent(first, second, asMaps(imported.idMaps), owner.email);
    const { id: _a, name: _n, createdAt: _c, ...settings } = first.workspace;
    expect(second.workspace).toMatchObject(settings);
    // No id of the old workspace's rows survives anywhere (text, JSON, keys).
    const oldIds = [demoId, ...Object.values(imported.idMaps).flatMap((m) => [...m.keys()])];
    expect(oldIds.filter((id) => again.text.includes(id))).toEqual([]);
    // The files came along byte for byte, under keys of the new workspace.
    expect(second.files.map((f) => f.sha256).sort()).toEqual(first.files.map((f) => f.sha256).sort());
    for (const row of second.tables.attachments!) expect(String(row.storageKey)).toMatch(new RegExp(`^workspaces/${imported.workspaceId}/files/`));
  });

  it("leaves the demo workspace exactly as it was", async () => {
    await signInAs(ownerId, demoId);
    const after = JSON.parse((await downloadExport()).text) as Doc;
    expect({ ...after, exportedAt: null }).toEqual({ ...first, exportedAt: null });
  });

  it("lets the importer switch to the new workspace", async () => {
    await signInAs(ownerId, demoId);
    expect(await switchWorkspaceAction({ workspaceId: imported.workspaceId })).toEqual({ ok: true, data: undefined });
    expect((await getViewer())?.workspace.id).toBe(imported.workspaceId);
  });
});
