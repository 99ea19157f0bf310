"use client";

import { memo, useState } from "react";
import { Button } from "@/components/ui/button";
import { Select } from "@/components/ui/select";
import type { BenchIngredient } from "@/lib/recipes/types";

/** Adds a library ingredient as a new line at 0 % (archived ones and those already in use are not offered). */
export const AddLine = memo(function AddLine({ library, used, onAdd }: { library: BenchIngredient[]; used: ReadonlySet<string>; onAdd: (ingredientId: string) => void }) {
  const options = library.filter((i) => !i.archived && !used.has(i.id)).map((i) => ({ value: i.id, label: i.name }));
  const [choice, setChoice] = useState<string>("");
  const chosen = options.some((o) => o.value === choice) ? choice : "";
  return (
    <div className="mt-3 flex items-end gap-2">
      <div className="min-w-0 flex-1">
        <Select
          ariaLabel="Ingredient to add"
          value={chosen}
          onValueChange={setChoice}
          options={options}
          placeholder={options.length ? "Add an ingredient from the library…" : "Every library ingredient is in the recipe"}
        />
      </div>
      <Button
        variant="secondary"
        disabled={!chosen}
        onClick={() => {
          onAdd(chosen);
          setChoice("");
        }}
      >
        Add line
      </Button>
    </div>
  );
});
