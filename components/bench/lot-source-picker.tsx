"use client";

import { Select } from "@/components/ui/select";
import { money } from "@/lib/recipes/format";
import type { LotPriceSource } from "@/lib/recipes/lot-prices";

export const PREFERRED = "preferred";

/**
 * The price source of one nibs or cocoa liquor line: the preferred supplier's
 * quote, or nibs from one of the workspace's bean lots (an estimate while the
 * lot's winnowing is not recorded).
 */
export function LotSourcePicker({
  ingredientId,
  name,
  value,
  sources,
  currency,
  onChange,
}: {
  ingredientId: string;
  name: string;
  value: string;
  sources: readonly LotPriceSource[];
  currency: string;
  onChange: (lotId: string) => void;
}) {
  const options = [
    { value: PREFERRED, label: "Preferred supplier's quote" },
    ...sources.map((s) => ({
      value: s.lotId,
      label: `Nibs from lot ${s.code} (${s.originCountry}) · ${money(s.perKg, currency)}/kg${s.estimated ? ", estimate" : ""}`,
    })),
  ];
  const chosen = sources.find((s) => s.lotId === value);
  return (
    <div className="space-y-1.5" data-testid={`price-source-${ingredientId}`}>
      <p className="text-sm font-semibold text-cocoa-700">Price of {name}</p>
      <Select value={chosen ? value : PREFERRED} onValueChange={onChange} options={options} ariaLabel={`Price source of ${name}`} />
      {chosen?.estimated ? (
        <p className="text-xs text-cocoa-500" data-testid="lot-estimate-note">
          Estimate: lot {chosen.code} has no winnowing recorded, so its nibs are reckoned at the workspace&apos;s estimated yield.
        </p>
      ) : null}
    </div>
  );
}
