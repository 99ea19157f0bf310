import { Card, CardHeader } from "@/components/ui/card";
import { Table, Td, Th } from "@/components/ui/table";
import type { VersionDetail } from "@/lib/data/recipes-versions";
import { money, pct } from "@/lib/recipes/format";

/** A saved version's lines with the ingredient data and prices they had at save, and its cost (prices only for those who may see costs). */
export function VersionLinesCard({ version, currency, showCost }: { version: VersionDetail; currency: string; showCost: boolean }) {
  const allergens = [...new Set(version.lines.flatMap((l) => l.allergens))];
  return (
    <Card>
      <CardHeader
        title="Lines"
        description={`As saved, with each ingredient's data${showCost ? " and price" : ""} at that time. Bar mass ${Number(version.barMassGrams)} g.`}
      />
      <Table>
        <thead>
          <tr>
            <Th>Ingredient</Th>
            <Th numeric>Share</Th>
            {showCost ? <Th numeric>Price per kg at save</Th> : null}
          </tr>
        </thead>
        <tbody>
          {version.lines.map((l) => (
            <tr key={l.ingredientId}>
              <Td>
                {l.name}
                {l.isInclusion ? <span className="ml-2 text-xs text-cocoa-500">inclusion</span> : null}
              </Td>
              <Td numeric>{pct(l.percent, 2)}</Td>
              {showCost ? <Td numeric>{money(l.pricePerKg, currency)}</Td> : null}
            </tr>
          ))}
        </tbody>
      </Table>
      {showCost ? (
        <dl className="mt-4 grid grid-cols-2 gap-2 text-sm">
          <dt>Ingredient cost per kg</dt>
          <dd className="figures text-right font-semibold">{money(version.costPerKg, currency)}</dd>
          <dt>Ingredient cost per bar</dt>
          <dd className="figures text-right font-semibold">{money(version.costPerBar, currency, 3)}</dd>
        </dl>
      ) : null}
      {allergens.length ? (
        <p className="mt-3 text-sm">
          Allergens in its ingredients (EU 1169/2011 Annex II): <strong>{allergens.join(", ")}</strong>. Check cross-contact and your local labelling rules.
        </p>
      ) : null}
    </Card>
  );
}
