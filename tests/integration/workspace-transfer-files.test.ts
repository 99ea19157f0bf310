import { count, eq } from "drizzle-orm";
import { beforeAll, beforeEach, describe, expect, it } from "vitest";
import { GET as download } from "@/app/api/files/[fileId]/route";
import { db } from "@/db/client";
import { attachments, workspaces } from "@/db/schema";
import { addAttachment } from "@/lib/data/attachments";
import { sha256Hex } from "@/lib/workspace-transfer/files";
import { createTeam, signInAs, type TeamFixture } from "../support/fixtures";
import { tinyPdf, tinyPng, windowsExecutable } from "../support/files";
import { makeIngredient, makeSupplier } from "../support/ingredients";
import { base, params } from "../support/matrix";
import { freshRequest } from "../support/request";
import { downloadExport, uploadExport, type Doc } from "../support/workspace-transfer";

let team: TeamFixture;
const pdf = tinyPdf("Cane sugar spec (invented)");
const png = tinyPng();

beforeAll(async () => {
  team = await createTeam("move-files");
  const ingredient = await makeIngredient(team.workspaceId);
  const supplier = await makeSupplier(team.workspaceId);
  const userId = team.people.formulator.id;
  await addAttachment({ workspaceId: team.workspaceId, userId, owner: { ingredientId: ingredient.id }, kind: "spec_sheet", fileName: "Sugar spec.pdf", bytes: pdf });
  await addAttachment({ workspaceId: team.workspaceId, userId, owner: { supplierId: supplier.id }, kind: "certificate", fileName: "Certificate.png", bytes: png });
});

beforeEach(async () => {
  freshRequest();
  await signInAs(team.people.owner.id, team.workspaceId);
});

const workspaceCount = async () => (await db.select({ n: count() }).from(workspaces))[0]!.n;

/** The imported workspace's files, fetched through the download route as its owner. */
async function filesOf(workspaceId: string): Promise<Record<string, Uint8Array>> {
  await signInAs(team.people.owner.id, workspaceId);
  const rows = await db.select().from(attachments).where(eq(attachments.workspaceId, workspaceId));
  const out: Record<string, Uint8Array> = {};
  for (const row of rows) {
    const res = await download(new Request(`${base}/api/files/${row.id}`), params({ fileId: row.id }));
    expect(res.status).toBe(200);
    out[row.fileName] = new Uint8Array(await res.arrayBuffer());
  }
  return out;
}

describe("moving a workspace's files", () => {
  it("puts each file's bytes in the export as base64 with its SHA-256, and the import stores copies byte for byte", async () => {
    const exported = JSON.parse((await downloadExport("include")).text) as Doc;
    expect(exported.files.map((f) => f.sha256).sort()).toEqual([sha256Hex(pdf), sha256Hex(png)].sort());
    for (const f of exported.files) expect(f.data).toBeTypeOf("string");
    const res = await uploadExport(JSON.stringify(exported));
    expect(res.status).toBe(200);
    expect(res.body.files).toBe(2);
    expect(await filesOf(String(res.body.workspaceId))).toEqual({ "Sugar spec.pdf": pdf, "Certificate.png": png });
  });

  it("references files by key and SHA-256 when asked, and the same server copies them on import", async () => {
    const exported = JSON.parse((await downloadExport("reference")).text) as Doc;
    for (const f of exported.files) expect(f).not.toHaveProperty("data");
    const res = await uploadExport(JSON.stringify(exported));
    expect(res.status).toBe(200);
    expect(await filesOf(String(res.body.workspaceId))).toEqual({ "Sugar spec.pdf": pdf, "Certificate.png": png });
  });

  it("refuses referenced files to an owner of another workspace (the bytes must be in the file then)", async () => {
    const exported = (await downloadExport("reference")).text;
    const other = await createTeam("move-files-other");
    freshRequest();
    await signInAs(other.people.owner.id, other.workspaceId);
    const before = await workspaceCount();
    const res = await uploadExport(exported);
    expect(res.status).toBe(422);
    expect((res.body.error as { message: string }).message).toMatch(/not on this server \(or not in a workspace you own\)/);
    expect(await workspaceCount()).toBe(before);
  });

  it("refuses files whose bytes do not match their checksum, or are not a PDF, PNG or JPEG", async () => {
    const doc = JSON.parse((await downloadExport("include")).text) as Doc;
    const before = await workspaceCount();
    const tampered = structuredClone(doc);
    tampered.files[0]!.data = Buffer.from(tinyPdf("altered")).toString("base64");
    const first = await uploadExport(JSON.stringify(tampered));
    expect(first.status).toBe(422);
    expect((first.body.error as { message: string }).message).toMatch(/does not match its recorded checksum/);

    const exe = windowsExecutable();
    const disguised = structuredClone(doc);
    Object.assign(disguised.files[0]!, { data: Buffer.from(exe).toString("base64"), sha256: sha256Hex(exe), sizeBytes: exe.byteLength });
    const second = await uploadExport(JSON.stringify(disguised));
    expect(second.status).toBe(422);
    expect((second.body.error as { message: string }).message).toMatch(/A file inside the export was refused: That file is really of type EXE/);
    expect(await workspaceCount()).toBe(before);
  });
});
