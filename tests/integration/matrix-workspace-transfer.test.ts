// Rights: only an owner may take a whole workspace out (every price, recipe and
// person in one file) or make a new one from a file. A product decision, common
// practice for account-level exports, no single source.
import { runMatrix, fromStatus } from "../support/matrix";
import { exportWorkspace } from "@/lib/workspace-transfer/export";
import { downloadExport, uploadExport } from "../support/workspace-transfer";

runMatrix("workspace transfer", [
  {
    name: "GET /api/workspace/export",
    permission: "workspace.export",
    outsider: "ok", // only ever exports the caller's own workspace
    run: async () => fromStatus((await downloadExport()).status),
  },
  {
    name: "POST /api/workspace/import",
    permission: "workspace.import",
    outsider: "ok", // makes a new workspace of the caller's own
    run: async ({ team }) => fromStatus((await uploadExport(await exportWorkspace({ workspaceId: team.workspaceId, includeFiles: true }))).status),
  },
]);
