import { Button } from "@/components/ui/button";
import { fieldClass } from "@/components/ui/input";
import { cn } from "@/lib/cn";

/** Pick two versions to see side by side (a GET form: the comparison has its own address). */
export function CompareForm({ recipeId, versions, a, b }: { recipeId: string; versions: number[]; a: number; b: number }) {
  const select = (id: string, name: string, value: number, label: string) => (
    <div className="flex flex-col gap-1.5">
      <label htmlFor={id} className="text-sm font-semibold text-cocoa-700">
        {label}
      </label>
      <select id={id} name={name} defaultValue={String(value)} className={cn(fieldClass, "w-28")}>
        {versions.map((v) => (
          <option key={v} value={v}>
            v{v}
          </option>
        ))}
      </select>
    </div>
  );
  return (
    <form method="get" action={`/recipes/${recipeId}/compare`} className="flex flex-wrap items-end gap-3">
      {select("compare-a", "a", a, "Compare")}
      {select("compare-b", "b", b, "with")}
      <Button type="submit" variant="secondary">
        Compare
      </Button>
    </form>
  );
}
