import { GET as downloadFile } from "@/app/api/files/[fileId]/route";
import { DELETE as deleteLotFile } from "@/app/api/lots/[lotId]/files/[fileId]/route";
import { GET as listLotFiles, POST as uploadLotFile } from "@/app/api/lots/[lotId]/files/route";
import { GET as getLot } from "@/app/api/lots/[lotId]/route";
import { GET as getLots } from "@/app/api/lots/route";
import {
  addLotCostAction,
  createLotAction,
  createRoastPresetAction,
  recordCutTestAction,
  recordProcessingAction,
} from "@/app/(app)/lots/actions";
import { addAttachment } from "@/lib/data/attachments";
import type { TeamFixture } from "../support/fixtures";
import { tinyPdf } from "../support/files";
import { formRequest } from "../support/ingredients";
import { createTestLot, newKey } from "../support/lots";
import { base, form, fromResult, fromStatus, jsonRequest, params, runMatrix, type MatrixRow } from "../support/matrix";

/** A lot with one stored certificate, put there by the team's owner. */
async function lotWithFile(team: TeamFixture) {
  const lot = await createTestLot(team.workspaceId);
  const file = await addAttachment({ workspaceId: team.workspaceId, userId: team.people.owner.id, owner: { lotId: lot.id }, kind: "certificate", fileName: "origin.pdf", bytes: tinyPdf() });
  return { lotId: lot.id, fileId: file.id };
}

const rows: MatrixRow[] = [
  {
    name: "createLotAction",
    permission: "lots.edit",
    outsider: "ok", // creates in the caller's own workspace
    run: async () =>
      fromResult(
        await createLotAction(
          null,
          form({ code: `M-${newKey()}`, originCountry: "Ghana", arrivedOn: "2026-11-01", massReceivedKg: "50", pricePaid: "300", currency: "EUR" }),
        ),
      ),
  },
  {
    name: "addLotCostAction",
    permission: "lots.edit",
    outsider: "not_found",
    run: async ({ team }) => {
      const lot = await createTestLot(team.workspaceId);
      return fromResult(await addLotCostAction(null, form({ lotId: lot.id, label: "Insurance", amount: "12", currency: "EUR" })));
    },
  },
  {
    name: "recordCutTestAction",
    permission: "lots.edit",
    outsider: "not_found",
    run: async ({ team }) => {
      const lot = await createTestLot(team.workspaceId);
      return fromResult(
        await recordCutTestAction(
          null,
          form({ lotId: lot.id, testedOn: "2026-11-02", sampleSize: "100", wellFermented: "80", partlyFermented: "10", slaty: "5", mouldy: "2", insectDamaged: "2", germinated: "1" }),
        ),
      );
    },
  },
  {
    name: "recordProcessingAction",
    permission: "lots.process",
    outsider: "not_found",
    run: async ({ team }) => {
      const lot = await createTestLot(team.workspaceId);
      return fromResult(
        await recordProcessingAction(
          null,
          form({ lotId: lot.id, step: "sorting", performedOn: "2026-11-03", massInKg: "100", massOutKg: "97", rejectsKg: "3", submissionKey: newKey() }),
        ),
      );
    },
  },
  {
    name: "createRoastPresetAction",
    permission: "lots.process",
    outsider: "ok",
    run: async () => fromResult(await createRoastPresetAction(null, form({ name: `Preset ${newKey()}`, temperatureC: "130", minutes: "22" }))),
  },
  {
    name: "GET /api/lots",
    permission: "lots.read",
    outsider: "ok",
    run: async () => fromStatus((await getLots(new Request(`${base}/api/lots`), params())).status),
  },
  {
    name: "GET /api/lots/:lotId",
    permission: "lots.read",
    outsider: "not_found",
    run: async ({ team }) => {
      const lot = await createTestLot(team.workspaceId);
      return fromStatus((await getLot(new Request(`${base}/api/lots/${lot.id}`), params({ lotId: lot.id }))).status);
    },
  },
  {
    name: "GET /api/lots/:lotId/files",
    permission: "lots.read",
    outsider: "not_found",
    run: async ({ team }) => {
      const { lotId } = await lotWithFile(team);
      return fromStatus((await listLotFiles(new Request(`${base}/api/lots/${lotId}/files`), params({ lotId }))).status);
    },
  },
  {
    name: "POST /api/lots/:lotId/files",
    permission: "lots.edit",
    outsider: "not_found",
    run: async ({ team }) => {
      const lot = await createTestLot(team.workspaceId);
      const req = formRequest(`/api/lots/${lot.id}/files`, { file: new File([new Uint8Array(tinyPdf())], "organic.pdf"), kind: "certificate" });
      return fromStatus((await uploadLotFile(req, params({ lotId: lot.id }))).status);
    },
  },
  {
    name: "DELETE /api/lots/:lotId/files/:fileId",
    permission: "lots.edit",
    outsider: "not_found",
    run: async ({ team }) => {
      const { lotId, fileId } = await lotWithFile(team);
      return fromStatus((await deleteLotFile(jsonRequest("DELETE", `/api/lots/${lotId}/files/${fileId}`), params({ lotId, fileId }))).status);
    },
  },
  {
    name: "GET /api/files/:fileId (a lot's file)",
    permission: "lots.read",
    outsider: "not_found",
    run: async ({ team }) => {
      const { fileId } = await lotWithFile(team);
      return fromStatus((await downloadFile(new Request(`${base}/api/files/${fileId}`), params({ fileId }))).status);
    },
  },
];

runMatrix("lots", rows);
