import type { Metadata } from "next";
import Link from "next/link";
import { perKg, quotedPrice } from "@/components/data/money";
import { FilePanel } from "@/components/files/file-panel";
import { IngredientAdmin } from "@/components/ingredients/ingredient-admin";
import { IngredientProfile } from "@/components/ingredients/ingredient-profile";
import { PreferredSupplier } from "@/components/ingredients/preferred-supplier";
import { PriceHistoryChart } from "@/components/prices/price-history-chart";
import { QuoteForm } from "@/components/prices/quote-form";
import { QuotesTable } from "@/components/prices/quotes-table";
import { Badge } from "@/components/ui/badge";
import { Button } from "@/components/ui/button";
import { Card, CardHeader } from "@/components/ui/card";
import { requireViewer } from "@/lib/auth/current";
import { can } from "@/lib/auth/permissions";
import { getIngredientPriceForViewer } from "@/lib/cost-visibility/ingredients";
import { getIngredientById } from "@/lib/data/ingredients";
import { listSuppliers } from "@/lib/data/suppliers";
import { KIND_LABELS } from "@/lib/ingredients/kinds";
import { orNotFound, pageId } from "@/lib/pages/or-not-found";
import { isoDay } from "@/lib/pricing/convert";

export const metadata: Metadata = { title: "Ingredient" };

export default async function IngredientPage({ params }: { params: Promise<{ ingredientId: string }> }) {
  const viewer = await requireViewer();
  const ingredientId = pageId((await params).ingredientId);
  const workspaceId = viewer.workspace.id;
  const ingredient = await orNotFound(getIngredientById({ workspaceId, ingredientId }));
  const today = isoDay(new Date());
  const [suppliers, priced] = await Promise.all([listSuppliers({ workspaceId }), getIngredientPriceForViewer({ viewer, ingredientId, on: today })]);
  const price = priced.shown ? priced.price : null;
  const buyer = can(viewer.role, "suppliers.edit");
  const supplierOptions = suppliers.map((s) => ({ value: s.id, label: s.name, currency: s.currency }));
  return (
    <div className="space-y-8">
      <div className="flex flex-wrap items-end justify-between gap-4">
        <div>
          <p className="text-sm text-cocoa-500">
            <Link href="/ingredients" className="hover:underline">Ingredients</Link> / {KIND_LABELS[ingredient.kind]}
          </p>
          <h1 className="text-3xl font-bold">
            {ingredient.name}
            {ingredient.archived ? <Badge className="ml-3 align-middle">archived</Badge> : null}
          </h1>
        </div>
        {can(viewer.role, "ingredients.edit") ? <IngredientAdmin id={ingredient.id} name={ingredient.name} archived={ingredient.archived} /> : null}
      </div>

      <Card>
        <CardHeader title="Profile" description="Figures per 100 g of the ingredient as bought." />
        <IngredientProfile ingredient={ingredient} />
      </Card>

      {priced.shown ? (
        <Card>
          <CardHeader
            title="Price"
            description="The current price is the latest valid quote of the preferred supplier, in the workspace's base currency."
            action={
              <Button asChild variant="secondary" size="sm">
                <a href={`/api/quotes/export?ingredientId=${ingredient.id}`} download>
                  Export quotes
                </a>
              </Button>
            }
          />
          <div className="mb-6 flex flex-wrap items-center gap-6">
            <div>
              <p className="text-sm font-semibold text-cocoa-700">Preferred supplier</p>
              {buyer ? (
                <PreferredSupplier ingredientId={ingredient.id} value={ingredient.preferredSupplierId} suppliers={supplierOptions} />
              ) : (
                <p>{ingredient.preferredSupplierName ?? "None chosen"}</p>
              )}
            </div>
            <div data-testid="current-price">
              <p className="text-sm font-semibold text-cocoa-700">Current price, {today}</p>
              {price?.status === "priced" ? (
                <p>
                  <span className="figures text-2xl font-bold">{perKg(price.pricePerKg, price.baseCurrency)}</span>
                  <span className="ml-2 text-sm text-cocoa-500">
                    {quotedPrice(price.quoted)} from {price.supplierName}
                    {price.quoted.currency !== price.baseCurrency ? ` at ${price.rate.rateToBase} ${price.baseCurrency}/${price.quoted.currency} (${price.rate.validOn})` : ""}
                  </span>
                </p>
              ) : (
                <p className="text-brick">{price?.message}</p>
              )}
            </div>
          </div>
          <PriceHistoryChart ingredientId={ingredient.id} today={today} />
          <div className="mt-6">
            <QuotesTable filter={{ ingredientId: ingredient.id }} hide={["ingredient"]} />
          </div>
          {buyer && !ingredient.archived ? (
            <div className="mt-8 border-t border-sand-light pt-6">
              <h3 className="mb-4 font-bold">Record a quote</h3>
              <QuoteForm ingredientId={ingredient.id} suppliers={supplierOptions} defaultCurrency={supplierOptions[0]?.currency ?? "EUR"} today={today} />
            </div>
          ) : null}
        </Card>
      ) : (
        <Card>
          <CardHeader title="Supplier" description="Prices and quotes are for the owner, the buyer and the formulator unless the owner shares costs." />
          <p className="text-sm font-semibold text-cocoa-700">Preferred supplier</p>
          <p>{ingredient.preferredSupplierName ?? "None chosen"}</p>
        </Card>
      )}

      <Card>
        <CardHeader title="Spec sheets and certificates" description="Only members of this workspace can download them." />
        <FilePanel owner={{ kind: "ingredients", id: ingredient.id }} canEdit={can(viewer.role, "ingredients.edit")} />
      </Card>
    </div>
  );
}
