import type { Metadata } from "next";
import Link from "next/link";
import { CompareTable } from "@/components/costing/compare-table";
import { CostsNotAllowed } from "@/components/costing/costs-not-allowed";
import { canSeeCosts } from "@/lib/auth/costs";
import { requireViewer } from "@/lib/auth/current";
import { can } from "@/lib/auth/permissions";
import { loadRecipeCosting, type RecipeCosting } from "@/lib/data/costing";
import { AppError } from "@/lib/errors";
import { isoDay } from "@/lib/pricing/convert";
import { compareRefSchema } from "@/lib/validation/costing";

export const metadata: Metadata = { title: "Compare costs" };

/** At most this many versions side by side: wider stops being readable. */
const MAX_COMPARED = 6;

/** Several recipe versions side by side: cost per bar with each one's chosen combination, margins and composition. */
export default async function CompareCostsPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const viewer = await requireViewer();
  if (!(await canSeeCosts(viewer))) return <CostsNotAllowed />;
  const raw = (await searchParams).v;
  const refs = (Array.isArray(raw) ? raw : raw ? [raw] : []).map((v) => compareRefSchema.safeParse(v)).filter((r) => r.success).map((r) => r.data);
  const unique = [...new Map(refs.map((r) => [`${r.recipeId}:${r.versionNo}`, r])).values()].slice(0, MAX_COMPARED);
  const on = isoDay(new Date());
  const releasedOnly = !can(viewer.role, "recipes.read");
  const loaded = await Promise.all(
    unique.map((r) =>
      loadRecipeCosting({ workspaceId: viewer.workspace.id, recipeId: r.recipeId, versionNo: r.versionNo === "latest" ? undefined : r.versionNo, on, releasedOnly }).catch((err: unknown) => {
        // A version that is gone (or never was ours) is simply left out of the comparison.
        if (err instanceof AppError && err.code === "not_found") return null;
        throw err;
      }),
    ),
  );
  const costings = loaded.filter((c): c is RecipeCosting => c !== null);
  return (
    <div className="space-y-6">
      <p className="text-sm">
        <Link href="/costing" className="text-cocoa-500 hover:text-cocoa hover:underline">
          Costing
        </Link>
      </p>
      <div>
        <h1 className="text-3xl font-bold">Compare costs</h1>
        <p className="mt-1 max-w-3xl text-sm text-cocoa-700">
          Each version with its recipe&apos;s chosen combination of suppliers (the preferred supplier where none is chosen) and cost settings, at the quotes
          valid today. Composition as computed when the version was saved.
        </p>
      </div>
      {costings.length < 2 ? (
        <p className="rounded-lg bg-pod-light px-3 py-2 text-sm text-pod-dark" role="status">
          Tick at least two recipes on the <Link href="/costing" className="font-semibold underline">Costing</Link> page to compare them
          {refs.length > unique.length ? ` (at most ${MAX_COMPARED} at once)` : ""}.
        </p>
      ) : null}
      {costings.length > 0 ? <CompareTable costings={costings} /> : null}
      {refs.length > MAX_COMPARED ? <p className="text-sm text-cocoa-500">Only the first {MAX_COMPARED} are shown.</p> : null}
    </div>
  );
}
