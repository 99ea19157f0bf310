import { beforeEach, describe, expect, it } from "vitest";
import { GET as download } from "@/app/api/files/[fileId]/route";
import { DELETE as deleteIngredientFile } from "@/app/api/ingredients/[ingredientId]/files/[fileId]/route";
import { GET as listIngredientFiles, POST as uploadIngredientFile } from "@/app/api/ingredients/[ingredientId]/files/route";
import { POST as uploadSupplierFile } from "@/app/api/suppliers/[supplierId]/files/route";
import { addAttachment } from "@/lib/data/attachments";
import { MAX_FILE_BYTES } from "@/lib/files/check-upload";
import { createTeam, signInAs, type TeamFixture } from "../support/fixtures";
import { tinyPdf, tinyPng, windowsExecutable } from "../support/files";
import { formRequest, makeIngredient, makeSupplier } from "../support/ingredients";
import { base, jsonRequest, params } from "../support/matrix";
import { freshRequest } from "../support/request";

let team: TeamFixture;
let ingredientId: string;

beforeEach(async () => {
  team = await createTeam("files");
  ingredientId = (await makeIngredient(team.workspaceId)).id;
  freshRequest();
  await signInAs(team.people.formulator.id, team.workspaceId);
});

const upload = (bytes: Uint8Array, name: string, type = "application/pdf") =>
  uploadIngredientFile(formRequest(`/api/ingredients/${ingredientId}/files`, { file: new File([new Uint8Array(bytes)], name, { type }), kind: "spec_sheet" }), params({ ingredientId }));

describe("attaching a spec sheet", () => {
  it("stores a PDF under a generated key and gives it back byte for byte to members", async () => {
    const pdf = tinyPdf();
    const res = await upload(pdf, "../../etc/Sugar spec.pdf");
    expect(res.status).toBe(200);
    const { file } = (await res.json()) as { file: { id: string; fileName: string; contentType: string; sizeBytes: number } };
    expect(file).toMatchObject({ fileName: "Sugar spec.pdf", contentType: "application/pdf", sizeBytes: pdf.byteLength });

    freshRequest();
    await signInAs(team.people.viewer.id, team.workspaceId);
    const got = await download(new Request(`${base}/api/files/${file.id}`), params({ fileId: file.id }));
    expect(got.status).toBe(200);
    expect(got.headers.get("content-type")).toBe("application/pdf");
    expect(got.headers.get("content-disposition")).toMatch(/^attachment; filename="Sugar spec.pdf"/);
    expect(got.headers.get("x-content-type-options")).toBe("nosniff");
    expect(new Uint8Array(await got.arrayBuffer())).toEqual(pdf);

    const listed = await listIngredientFiles(new Request(`${base}/api/ingredients/${ingredientId}/files`), params({ ingredientId }));
    expect(((await listed.json()) as { files: { id: string }[] }).files.map((f) => f.id)).toEqual([file.id]);
  });

  it("judges the type by content: a PNG named .pdf is stored as a PNG", async () => {
    const res = await upload(tinyPng(), "certificate.pdf");
    expect(((await res.json()) as { file: { contentType: string } }).file.contentType).toBe("image/png");
  });

  it("refuses a renamed executable, whatever its name and claimed type", async () => {
    const res = await upload(windowsExecutable(), "spec-sheet.pdf");
    expect(res.status).toBe(422);
    expect(((await res.json()) as { error: { message: string } }).error.message).toMatch(/really of type EXE.*Attach a PDF, PNG or JPEG/);
  });

  it("refuses an oversize file: by its declared length before reading it, and by its real size", async () => {
    const req = formRequest(`/api/ingredients/${ingredientId}/files`, { file: new File([new Uint8Array(tinyPdf())], "big.pdf") });
    const declared = new Request(req, { headers: { ...Object.fromEntries(req.headers), "content-length": String(MAX_FILE_BYTES + 1_000_000) }, duplex: "half" } as RequestInit);
    const early = await uploadIngredientFile(declared, params({ ingredientId }));
    expect(early.status).toBe(413);

    const big = new Uint8Array(MAX_FILE_BYTES + 1);
    big.set(tinyPdf(), 0);
    await expect(
      addAttachment({ workspaceId: team.workspaceId, userId: team.people.formulator.id, owner: { ingredientId }, kind: "spec_sheet", fileName: "big.pdf", bytes: big }),
    ).rejects.toMatchObject({ code: "invalid", message: expect.stringMatching(/at most 10.0 MB/) });
  });
});

describe("who can reach a file", () => {
  it("answers 404 to a member of another workspace, for downloads and deletes", async () => {
    const res = await upload(tinyPdf(), "spec.pdf");
    const { file } = (await res.json()) as { file: { id: string } };
    const other = await createTeam("files-other");
    freshRequest();
    await signInAs(other.people.owner.id, other.workspaceId);
    expect((await download(new Request(`${base}/api/files/${file.id}`), params({ fileId: file.id }))).status).toBe(404);
    const del = await deleteIngredientFile(jsonRequest("DELETE", `/api/ingredients/${ingredientId}/files/${file.id}`), params({ ingredientId, fileId: file.id }));
    expect(del.status).toBe(404);
  });

  it("lets a buyer attach a supplier's certificate but not an ingredient's spec sheet", async () => {
    const supplierId = (await makeSupplier(team.workspaceId)).id;
    freshRequest();
    await signInAs(team.people.buyer.id, team.workspaceId);
    const ok = await uploadSupplierFile(formRequest(`/api/suppliers/${supplierId}/files`, { file: new File([new Uint8Array(tinyPdf())], "organic.pdf"), kind: "certificate" }), params({ supplierId }));
    expect(ok.status).toBe(200);
    expect((await upload(tinyPdf(), "spec.pdf")).status).toBe(403);
  });

  it("removes a file so it can no longer be downloaded", async () => {
    const { file } = (await (await upload(tinyPdf(), "spec.pdf")).json()) as { file: { id: string } };
    const del = await deleteIngredientFile(jsonRequest("DELETE", `/api/ingredients/${ingredientId}/files/${file.id}`), params({ ingredientId, fileId: file.id }));
    expect(del.status).toBe(200);
    expect((await download(new Request(`${base}/api/files/${file.id}`), params({ fileId: file.id }))).status).toBe(404);
  });
});
