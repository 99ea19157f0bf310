import { cookies } from "next/headers";
import { apiRoute } from "@/lib/api/route";
import { routeId } from "@/lib/api/route-id";
import { lucia } from "@/lib/auth/lucia";
import { AppError } from "@/lib/errors";
import { loadLabel } from "@/lib/labels/load-label";
import { printLabel } from "@/lib/labels/print-label";
import { labelDownloadSchema } from "@/lib/validation/labels";

/** "House dark 70 %" → "house-dark-70" for a file name. */
const slug = (name: string) => name.toLowerCase().replace(/[^a-z0-9]+/g, "-").replace(/^-|-$/g, "").slice(0, 60) || "label";

/**
 * GET /api/labels/:recipeId?version=N&format=pdf|png&paper=a4|letter — the label of a saved
 * version (released, else latest for those who read every version) as a file, printed on the
 * server by Chromium from /print/labels as the same user. BARWRIGHT_INTERNAL_ORIGIN sets where
 * the server reaches itself (default: the origin the request came to).
 */
export const GET = apiRoute({
  permission: "recipes.readReleased",
  schema: labelDownloadSchema,
  handler: async ({ input, viewer, params, request }) => {
    const { recipe, version } = await loadLabel({ viewer, recipeId: routeId(params.recipeId, "That recipe"), versionNo: input.version });
    const origin = process.env.BARWRIGHT_INTERNAL_ORIGIN ?? new URL(request.url).origin;
    const token = (await cookies()).get(lucia.sessionCookieName)?.value ?? "";
    const url = `${origin}/print/labels/${recipe.id}?version=${version.versionNo}&paper=${input.paper}`;
    let file: Buffer;
    try {
      file = await printLabel({ url, cookies: [{ name: lucia.sessionCookieName, value: token }], file: { format: input.format, paper: input.paper } });
    } catch (err) {
      console.error("label file failed:", err);
      throw new AppError("unavailable", "The label file could not be made just now. Open the printable page and print it from the browser instead.");
    }
    return new Response(new Uint8Array(file), {
      headers: {
        "content-type": input.format === "pdf" ? "application/pdf" : "image/png",
        "content-disposition": `attachment; filename="label-${slug(recipe.name)}-v${version.versionNo}.${input.format}"`,
        "cache-control": "no-store",
      },
    });
  },
});
