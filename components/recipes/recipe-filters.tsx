import { Button } from "@/components/ui/button";
import { fieldClass } from "@/components/ui/input";
import { cn } from "@/lib/cn";
import type { RecipeListQuery } from "@/lib/validation/recipes";

const TYPES = [
  ["", "All types"],
  ["dark", "Dark"],
  ["milk", "Milk"],
  ["white", "White"],
  ["other", "Other"],
] as const;

/** Search and filters as a plain GET form: the address is the state, so results can be shared and reloaded. */
export function RecipeFilters({ query, showStatus }: { query: RecipeListQuery; showStatus: boolean }) {
  return (
    <form method="get" action="/recipes" className="flex flex-wrap items-end gap-3" role="search">
      <div className="flex min-w-56 flex-1 flex-col gap-1.5">
        <label htmlFor="recipe-q" className="text-sm font-semibold text-cocoa-700">
          Search
        </label>
        <input id="recipe-q" name="q" type="search" defaultValue={query.q ?? ""} placeholder="Recipe name" className={fieldClass} />
      </div>
      <div className="flex flex-col gap-1.5">
        <label htmlFor="recipe-type" className="text-sm font-semibold text-cocoa-700">
          Type
        </label>
        <select id="recipe-type" name="type" defaultValue={query.type ?? ""} className={cn(fieldClass, "w-36")}>
          {TYPES.map(([value, label]) => (
            <option key={value} value={value}>
              {label}
            </option>
          ))}
        </select>
      </div>
      {showStatus ? (
        <div className="flex flex-col gap-1.5">
          <label htmlFor="recipe-status" className="text-sm font-semibold text-cocoa-700">
            Status
          </label>
          <select id="recipe-status" name="status" defaultValue={query.status ?? ""} className={cn(fieldClass, "w-40")}>
            <option value="">Any status</option>
            <option value="released">Released</option>
            <option value="draft">Never released</option>
          </select>
        </div>
      ) : null}
      {query.sort !== "updated" ? <input type="hidden" name="sort" value={query.sort} /> : null}
      {query.dir ? <input type="hidden" name="dir" value={query.dir} /> : null}
      <Button type="submit" variant="secondary">
        Show
      </Button>
    </form>
  );
}
