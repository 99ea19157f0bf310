"use client";

import { memo } from "react";
import { Card, CardHeader } from "@/components/ui/card";
import { AUTHORITIES, type Authority, type StandardResult } from "@/lib/formulation";
import type { ChocolateType } from "@/lib/recipes/types";
import { cn } from "@/lib/cn";
import { StandardCategory, type Fixer } from "./standard-category";

const AUTHORITY_NAMES: Record<Authority, string> = { EU: "EU", US: "US", Codex: "Codex" };

/** The categories a recipe of this type is usually meant to meet; their fixes are shown without asking. */
const AIMED: Record<ChocolateType, readonly string[]> = {
  dark: ["chocolate", "semisweet chocolate"],
  milk: ["milk chocolate"],
  white: ["white chocolate"],
  other: [],
};

/**
 * The standards check: for each chosen authority, every category with "meets" or
 * the failing limits and by how much, and (on the bench) the smallest two-line
 * change that meets it.
 */
export const StandardsPanel = memo(function StandardsPanel({
  standards,
  chosen,
  onChoose,
  chocolateType,
  fixer,
}: {
  standards: StandardResult[];
  chosen: readonly Authority[];
  onChoose?: (authorities: Authority[]) => void;
  chocolateType: ChocolateType;
  fixer?: Fixer;
}) {
  const toggle = (a: Authority) => onChoose?.(chosen.includes(a) ? chosen.filter((x) => x !== a) : AUTHORITIES.filter((x) => x === a || chosen.includes(x)));
  return (
    <Card data-testid="standards-panel">
      <CardHeader title="Standards check" description="Numeric limits of each legal category, on each authority's own basis." />
      {onChoose ? (
        <div className="mb-3 flex gap-2" role="group" aria-label="Authorities">
          {AUTHORITIES.map((a) => (
            <button
              key={a}
              type="button"
              aria-pressed={chosen.includes(a)}
              onClick={() => toggle(a)}
              className={cn(
                "rounded-full border px-3 py-1 text-sm font-semibold",
                chosen.includes(a) ? "border-pod bg-pod-light text-pod-dark" : "border-sand text-cocoa-500 hover:bg-cream-deep",
              )}
            >
              {AUTHORITY_NAMES[a]}
            </button>
          ))}
        </div>
      ) : null}
      <p className="mb-3 rounded-lg border border-sand bg-cream p-3 text-xs text-cocoa-700" role="note">
        Legal names depend on local regulations. Barwright checks the numeric limits only; it does not check which fats,
        milk ingredients or emulsifiers a category admits, labelling rules or national variations. Confirm the name you sell
        under with the rules where you sell.
      </p>
      {AUTHORITIES.filter((a) => chosen.includes(a)).map((authority) => (
        <section key={authority} className="mt-2">
          <h3 className="text-sm font-bold uppercase tracking-wide text-cocoa-500">{AUTHORITY_NAMES[authority]}</h3>
          <ul className="divide-y divide-sand-light">
            {standards
              .filter((s) => s.authority === authority)
              .map((s) => (
                <StandardCategory key={s.category} result={s} fixer={fixer} aimed={AIMED[chocolateType].includes(s.category)} />
              ))}
          </ul>
        </section>
      ))}
      {chosen.length === 0 ? <p className="text-sm text-cocoa-500">Choose an authority to check.</p> : null}
    </Card>
  );
});
