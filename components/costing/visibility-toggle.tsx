"use client";

import { useState, useTransition } from "react";
import { setCostVisibilityAction } from "@/app/(app)/costing/actions";
import { FormAlert } from "@/components/forms/form-alert";

/** The owner's switch: share costs, prices and margins with production and viewers, or not. */
export function VisibilityToggle({ shown }: { shown: boolean }) {
  const [checked, setChecked] = useState(shown);
  const [result, setResult] = useState<{ ok: boolean; message?: string } | null>(null);
  const [pending, start] = useTransition();
  return (
    <div className="space-y-2">
      <label className="flex items-center gap-3 text-sm font-semibold">
        <input
          type="checkbox"
          className="h-4 w-4 accent-pod"
          checked={checked}
          disabled={pending}
          onChange={(e) => {
            const show = e.target.checked;
            start(async () => {
              const r = await setCostVisibilityAction({ show });
              if (r.ok) setChecked(show);
              setResult(r.ok ? { ok: true, message: show ? "Production and viewers now see costs." : "Costs are hidden from production and viewers again." } : r);
            });
          }}
        />
        Show costs, prices and margins to production and viewers
      </label>
      <FormAlert result={result} />
    </div>
  );
}
