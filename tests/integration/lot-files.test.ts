import { and, eq } from "drizzle-orm";
import { beforeEach, describe, expect, it } from "vitest";
import { db } from "@/db/client";
import { beanLots } from "@/db/schema";
import { seedDemo } from "@/db/seed";
import { GET as download } from "@/app/api/files/[fileId]/route";
import { DELETE as deleteLotFile } from "@/app/api/lots/[lotId]/files/[fileId]/route";
import { GET as listLotFiles, POST as uploadLotFile } from "@/app/api/lots/[lotId]/files/route";
import { addAttachment, getAttachment, listAttachments } from "@/lib/data/attachments";
import { checkUpload, MAX_FILE_BYTES } from "@/lib/files/check-upload";
import { getObject } from "@/lib/storage/s3";
import { createTeam, signInAs, type TeamFixture } from "../support/fixtures";
import { tinyPdf, tinyPng, windowsExecutable } from "../support/files";
import { formRequest } from "../support/ingredients";
import { createTestLot } from "../support/lots";
import { base, jsonRequest, params } from "../support/matrix";
import { freshRequest } from "../support/request";

let team: TeamFixture;
let lotId: string;

beforeEach(async () => {
  team = await createTeam("lot-files");
  lotId = (await createTestLot(team.workspaceId)).id;
  freshRequest();
  await signInAs(team.people.buyer.id, team.workspaceId);
});

type FileJson = { id: string; fileName: string; kind: string; contentType: string; sizeBytes: number };
const upload = (bytes: Uint8Array, name: string, kind?: string) =>
  uploadLotFile(formRequest(`/api/lots/${lotId}/files`, { file: new File([new Uint8Array(bytes)], name), ...(kind ? { kind } : {}) }), params({ lotId }));
const list = async () => ((await (await listLotFiles(new Request(`${base}/api/lots/${lotId}/files`), params({ lotId }))).json()) as { files: FileJson[] }).files;
const errorOf = async (res: Response) => ((await res.json()) as { error: { message: string; fieldErrors?: Record<string, string[]> } }).error;

describe("certificates on a bean lot", () => {
  it("attaches a PDF as a certificate by default, lists it, and gives it back byte for byte to production", async () => {
    const pdf = tinyPdf("Certificate of origin");
    const res = await upload(pdf, "Origin EC.pdf");
    expect(res.status).toBe(200);
    const { file } = (await res.json()) as { file: FileJson };
    expect(file).toMatchObject({ fileName: "Origin EC.pdf", kind: "certificate", contentType: "application/pdf", sizeBytes: pdf.byteLength });
    expect((await list()).map((f) => f.id)).toEqual([file.id]);

    freshRequest();
    await signInAs(team.people.production.id, team.workspaceId);
    const got = await download(new Request(`${base}/api/files/${file.id}`), params({ fileId: file.id }));
    expect(got.status).toBe(200);
    expect(got.headers.get("content-type")).toBe("application/pdf");
    expect(new Uint8Array(await got.arrayBuffer())).toEqual(pdf);
  });

  it("keeps a lab report as an image judged by its bytes, newest first in the list", async () => {
    await upload(tinyPdf(), "organic.pdf", "certificate");
    const res = await upload(tinyPng(), "moisture lab report.pdf", "lab_report");
    expect(((await res.json()) as { file: FileJson }).file).toMatchObject({ kind: "lab_report", contentType: "image/png" });
    expect((await list()).map((f) => f.fileName)).toEqual(["moisture lab report.pdf", "organic.pdf"]);
  });

  it("refuses an executable renamed .pdf, a spec-sheet kind, and an oversize file, with messages that say why", async () => {
    const exe = await upload(windowsExecutable(), "certificate.pdf");
    expect(exe.status).toBe(422);
    expect((await errorOf(exe)).message).toMatch(/really of type EXE.*Attach a PDF, PNG or JPEG/);

    const spec = await upload(tinyPdf(), "spec.pdf", "spec_sheet");
    expect(spec.status).toBe(422);
    expect((await errorOf(spec)).fieldErrors?.kind).toEqual(["Choose certificate, lab report or other."]);

    const big = new Uint8Array(MAX_FILE_BYTES + 1);
    big.set(tinyPdf(), 0);
    await expect(
      addAttachment({ workspaceId: team.workspaceId, userId: team.people.buyer.id, owner: { lotId }, kind: "certificate", fileName: "big.pdf", bytes: big }),
    ).rejects.toMatchObject({ code: "invalid", message: expect.stringMatching(/at most 10.0 MB/) });
    expect(await list()).toEqual([]);
  });

  it("removes a file so it is neither listed nor downloadable", async () => {
    const { file } = (await (await upload(tinyPdf(), "origin.pdf")).json()) as { file: FileJson };
    const del = await deleteLotFile(jsonRequest("DELETE", `/api/lots/${lotId}/files/${file.id}`), params({ lotId, fileId: file.id }));
    expect(del.status).toBe(200);
    expect(await list()).toEqual([]);
    expect((await download(new Request(`${base}/api/files/${file.id}`), params({ fileId: file.id }))).status).toBe(404);
  });

  it("answers 404 to another workspace's owner for the list, the upload, the download and the removal", async () => {
    const { file } = (await (await upload(tinyPdf(), "origin.pdf")).json()) as { file: FileJson };
    const other = await createTeam("lot-files-other");
    freshRequest();
    await signInAs(other.people.owner.id, other.workspaceId);
    expect((await listLotFiles(new Request(`${base}/api/lots/${lotId}/files`), params({ lotId }))).status).toBe(404);
    expect((await upload(tinyPdf(), "mine.pdf")).status).toBe(404);
    expect((await download(new Request(`${base}/api/files/${file.id}`), params({ fileId: file.id }))).status).toBe(404);
    const del = await deleteLotFile(jsonRequest("DELETE", `/api/lots/${lotId}/files/${file.id}`), params({ lotId, fileId: file.id }));
    expect(del.status).toBe(404);
  });

  it("does not let a file of one lot be removed through another lot's address", async () => {
    const { file } = (await (await upload(tinyPdf(), "origin.pdf")).json()) as { file: FileJson };
    const otherLot = (await createTestLot(team.workspaceId)).id;
    const del = await deleteLotFile(jsonRequest("DELETE", `/api/lots/${otherLot}/files/${file.id}`), params({ lotId: otherLot, fileId: file.id }));
    expect(del.status).toBe(404);
    expect((await list()).map((f) => f.id)).toEqual([file.id]);
  });
});

describe("the demo's sample certificate", () => {
  it("is one readable PDF on lot EC-2026-07, stored once however often the demo is seeded", async () => {
    const { workspaceId } = await seedDemo(db);
    await seedDemo(db);
    const [lot] = await db.select({ id: beanLots.id }).from(beanLots).where(and(eq(beanLots.workspaceId, workspaceId), eq(beanLots.code, "EC-2026-07")));
    const files = await listAttachments({ workspaceId, owner: { lotId: lot!.id } });
    expect(files.map((f) => [f.fileName, f.kind, f.contentType])).toEqual([["EC-2026-07 certificate of origin.pdf", "certificate", "application/pdf"]]);
    const row = await getAttachment({ workspaceId, attachmentId: files[0]!.id });
    const bytes = new Uint8Array(await new Response((await getObject({ key: row.storageKey })).body).arrayBuffer());
    expect(await checkUpload(bytes)).toMatchObject({ ok: true, contentType: "application/pdf" });
    expect(Buffer.from(bytes).toString("latin1")).toMatch(/DEMO DATA, INVENTED[\s\S]*startxref\n\d+\n%%EOF\n$/);
  });
});
