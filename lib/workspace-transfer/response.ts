import "server-only";
import { exportWorkspaceChunks } from "./export";

/** "barwright-fenwick-lane-chocolate-works-2026-12-02.json" */
export function exportFileName(workspaceName: string, on: Date): string {
  const slug = workspaceName.toLowerCase().replace(/[^a-z0-9]+/g, "-").replace(/^-|-$/g, "").slice(0, 60) || "workspace";
  return `barwright-${slug}-${on.toISOString().slice(0, 10)}.json`;
}

/**
 * The export as a streamed download. The first chunk is read before answering,
 * so a missing workspace or a database error still gets a proper error status;
 * a failure later cuts the download short, which an import then refuses.
 */
export async function exportResponse({ workspaceId, includeFiles, fileName }: { workspaceId: string; includeFiles: boolean; fileName: string }): Promise<Response> {
  const chunks = exportWorkspaceChunks({ workspaceId, includeFiles });
  const first = await chunks.next();
  const encoder = new TextEncoder();
  const body = new ReadableStream<Uint8Array>({
    start(controller) {
      if (!first.done) controller.enqueue(encoder.encode(first.value));
    },
    async pull(controller) {
      try {
        // Rows are small: send them in pieces of about 64 kB, not one by one.
        let piece = "";
        while (piece.length < 65_536) {
          const next = await chunks.next();
          if (next.done) {
            if (piece) controller.enqueue(encoder.encode(piece));
            controller.close();
            return;
          }
          piece += next.value;
        }
        controller.enqueue(encoder.encode(piece));
      } catch (err) {
        console.error("workspace export failed part way:", err);
        controller.error(err);
      }
    },
    async cancel() {
      await chunks.return(undefined);
    },
  });
  return new Response(body, {
    headers: {
      "content-type": "application/json; charset=utf-8",
      "content-disposition": `attachment; filename="${fileName}"`,
      "cache-control": "private, no-store",
      "x-content-type-options": "nosniff",
    },
  });
}
