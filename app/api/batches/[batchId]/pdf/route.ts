import { cookies } from "next/headers";
import { z } from "zod";
import { apiRoute } from "@/lib/api/route";
import { routeId } from "@/lib/api/route-id";
import { lucia } from "@/lib/auth/lucia";
import { getBatch } from "@/lib/data/batches";
import { AppError } from "@/lib/errors";
import { printToPdf } from "@/lib/print/pdf";

const querySchema = z.object({ paper: z.enum(["a4", "letter"], "Paper: a4 or letter.").default("a4") }).strict();

/**
 * GET /api/batches/:batchId/pdf?paper=a4|letter — the batch sheet as a PDF:
 * our own print page, printed on the server by Chromium as the same user.
 * BARWRIGHT_INTERNAL_ORIGIN sets where the server reaches itself (default:
 * the origin the request came to).
 */
export const GET = apiRoute({
  permission: "batches.plan",
  schema: querySchema,
  handler: async ({ input, viewer, params, request }) => {
    const batch = await getBatch({ workspaceId: viewer.workspace.id, batchId: routeId(params.batchId, "That batch") });
    const origin = process.env.BARWRIGHT_INTERNAL_ORIGIN ?? new URL(request.url).origin;
    const token = (await cookies()).get(lucia.sessionCookieName)?.value ?? "";
    let pdf: Buffer;
    try {
      pdf = await printToPdf({ url: `${origin}/print/batches/${batch.id}?paper=${input.paper}`, cookies: [{ name: lucia.sessionCookieName, value: token }], paper: input.paper });
    } catch (err) {
      console.error("batch sheet PDF failed:", err);
      throw new AppError("unavailable", "The PDF could not be made just now. Open the printable sheet and print it from the browser instead.");
    }
    return new Response(new Uint8Array(pdf), {
      headers: {
        "content-type": "application/pdf",
        "content-disposition": `attachment; filename="batch-${batch.code}.pdf"`,
        "cache-control": "no-store",
      },
    });
  },
});
