"use client";

import { Field } from "@/components/ui/field";
import { NumberField } from "@/components/ui/number-field";
import { Select } from "@/components/ui/select";
import type { CategoryRef } from "@/lib/formulation";
import { categoryKey, type LeastCostSettings } from "./least-cost-problem";

const TARGET_MODES = [
  { value: "atLeast", label: "At least" },
  { value: "exactly", label: "Exactly" },
  { value: "none", label: "No target" },
];

const OBJECTIVES = [
  { value: "cost", label: "Lowest cost" },
  { value: "closest", label: "Lowest cost, fewest changes" },
];

/** The standards to meet, the cocoa target and what to minimise. */
export function LeastCostSettingsForm({
  settings,
  categories,
  onChange,
}: {
  settings: LeastCostSettings;
  categories: CategoryRef[];
  onChange: (next: LeastCostSettings) => void;
}) {
  const toggle = (key: string, on: boolean) =>
    onChange({ ...settings, categories: on ? [...settings.categories, key] : settings.categories.filter((k) => k !== key) });
  return (
    <div className="space-y-3">
      <fieldset>
        <legend className="text-sm font-semibold text-cocoa-700">Must meet</legend>
        <div className="mt-1 grid gap-1 @sm:grid-cols-2">
          {categories.map((c) => {
            const key = categoryKey(c);
            return (
              <label key={key} className="flex items-center gap-2 text-sm">
                <input type="checkbox" checked={settings.categories.includes(key)} onChange={(e) => toggle(key, e.target.checked)} />
                {c.authority} {c.category}
              </label>
            );
          })}
        </div>
      </fieldset>
      <div className="grid gap-3 @sm:grid-cols-2">
        <Field id="least-cost-target-mode" label="Total dry cocoa solids (EU basis)">
          <Select id="least-cost-target-mode" ariaLabel="Cocoa target" value={settings.targetMode} onValueChange={(v) => onChange({ ...settings, targetMode: v as LeastCostSettings["targetMode"] })} options={TARGET_MODES} />
        </Field>
        <Field id="least-cost-target" label="Cocoa target">
          <NumberField id="least-cost-target" unit="%" value={settings.target} disabled={settings.targetMode === "none"} onChange={(e) => onChange({ ...settings, target: e.target.value })} />
        </Field>
      </div>
      <Field id="least-cost-objective" label="Find">
        <Select id="least-cost-objective" ariaLabel="Objective" value={settings.objective} onValueChange={(v) => onChange({ ...settings, objective: v as LeastCostSettings["objective"] })} options={OBJECTIVES} />
      </Field>
    </div>
  );
}
