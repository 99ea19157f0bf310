import Link from "next/link";
import { Button } from "@/components/ui/button";
import { fieldClass } from "@/components/ui/input";
import { cn } from "@/lib/cn";
import { formatDate } from "@/lib/format";

/** The recipe's name, the version costed (a GET form: each version has its own address) and the exports. */
export function CostingHeader({
  recipe,
  versionNo,
  versionNumbers,
  on,
  currency,
}: {
  recipe: { id: string; name: string };
  versionNo: number;
  versionNumbers: number[];
  on: string;
  currency: string;
}) {
  return (
    <div className="mb-6 space-y-3">
      <p className="text-sm">
        <Link href="/costing" className="text-cocoa-500 hover:text-cocoa hover:underline">
          Costing
        </Link>
      </p>
      <div className="flex flex-wrap items-end justify-between gap-4">
        <div>
          <h1 className="text-3xl font-bold" data-testid="costing-recipe-name">
            {recipe.name}
          </h1>
          <p className="mt-1 text-sm text-cocoa-700">
            Prices of {formatDate(on)} (quotes valid that day, that day&apos;s exchange rates), in {currency}.{" "}
            <Link href={`/recipes/${recipe.id}`} className="text-pod-dark hover:underline">
              Open the bench
            </Link>
          </p>
        </div>
        <div className="flex flex-wrap items-end gap-2">
          <form method="get" className="flex items-end gap-2">
            <label className="flex flex-col gap-1.5 text-sm font-semibold text-cocoa-700">
              Version
              <select name="version" defaultValue={String(versionNo)} className={cn(fieldClass, "w-24")}>
                {[...versionNumbers].reverse().map((v) => (
                  <option key={v} value={v}>
                    v{v}
                  </option>
                ))}
              </select>
            </label>
            <Button type="submit" variant="secondary">
              Show
            </Button>
          </form>
          <Button asChild variant="secondary">
            <a href={`/api/costing/${recipe.id}/comparison?version=${versionNo}`} download>
              Download CSV
            </a>
          </Button>
          <Button asChild variant="secondary">
            <Link href={`/print/costing/${recipe.id}?version=${versionNo}`} target="_blank">
              Printable page
            </Link>
          </Button>
          <Button asChild variant="secondary">
            <Link href={`/costing/compare?v=${recipe.id}:${Math.max(1, versionNo - 1)}&v=${recipe.id}:${versionNo}`}>Compare versions</Link>
          </Button>
        </div>
      </div>
    </div>
  );
}
