import { GET as getLot } from "@/app/api/lots/[lotId]/route";
import { GET as getLots } from "@/app/api/lots/route";
import {
  addLotCostAction,
  createLotAction,
  createRoastPresetAction,
  recordCutTestAction,
  recordProcessingAction,
} from "@/app/(app)/lots/actions";
import { createTestLot, newKey } from "../support/lots";
import { base, form, fromResult, fromStatus, params, runMatrix, type MatrixRow } from "../support/matrix";

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
];

runMatrix("lots", rows);
