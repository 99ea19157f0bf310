import Link from "next/link";
import { cn } from "@/lib/cn";

/** Links to the label of each saved version the viewer may see; the released one is marked. */
export function LabelVersionPicker({ recipeId, current, releasedNo, versions }: { recipeId: string; current: number; releasedNo: number | null; versions: number[] }) {
  return (
    <nav aria-label="Label of version" className="flex flex-wrap items-center gap-1 text-sm">
      <span className="mr-1 text-cocoa-500">Label of</span>
      {versions.map((n) => (
        <Link
          key={n}
          href={`/recipes/${recipeId}/label?version=${n}`}
          aria-current={n === current ? "page" : undefined}
          className={cn("rounded-md px-2.5 py-1 font-semibold text-cocoa-700 hover:bg-cream-deep", n === current && "bg-pod-light text-pod-dark")}
        >
          v{n}
          {n === releasedNo ? <span className="font-normal text-sage"> released</span> : null}
        </Link>
      ))}
    </nav>
  );
}
