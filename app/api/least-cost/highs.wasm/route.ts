import { readFile } from "node:fs/promises";
import path from "node:path";
import { z } from "zod";
import { apiRoute } from "@/lib/api/route";

let wasm: Promise<Buffer> | undefined;

/**
 * GET /api/least-cost/highs.wasm — the HiGHS solver's WebAssembly (from the `highs` package) for
 * the bench's least-cost panel, which solves in the browser. Served from the installed package so
 * the binary is never copied into the repository; read once per process.
 */
export const GET = apiRoute({
  permission: "recipes.read",
  schema: z.object({}).strict(),
  handler: async () => {
    wasm ??= readFile(path.join(process.cwd(), "node_modules", "highs", "build", "highs.wasm"));
    const bytes = await wasm;
    return new Response(new Uint8Array(bytes), {
      headers: { "content-type": "application/wasm", "cache-control": "private, max-age=86400" },
    });
  },
});
