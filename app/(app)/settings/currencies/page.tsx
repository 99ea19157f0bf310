import type { Metadata } from "next";
import { BaseCurrencyForm, ExchangeRates } from "@/components/prices/exchange-rates";
import { Card, CardHeader } from "@/components/ui/card";
import { requireViewer } from "@/lib/auth/current";
import { can } from "@/lib/auth/permissions";
import { getBaseCurrency, listExchangeRates } from "@/lib/data/exchange-rates";
import { isoDay } from "@/lib/pricing/convert";

export const metadata: Metadata = { title: "Currencies" };

export default async function CurrenciesPage() {
  const viewer = await requireViewer();
  const workspaceId = viewer.workspace.id;
  const [base, rates] = await Promise.all([getBaseCurrency({ workspaceId }), listExchangeRates({ workspaceId })]);
  const canEdit = can(viewer.role, "suppliers.edit");
  return (
    <div className="space-y-6">
      <div>
        <h1 className="text-3xl font-bold">Currencies</h1>
        <p className="mt-2 max-w-2xl text-cocoa-700">
          Costs are shown in {base}. A quote in another currency is converted with the latest rate you entered on or before the day
          that counts. Barwright never fetches rates itself: enter the ones your bank or supplier uses.
        </p>
      </div>
      {canEdit ? (
        <Card>
          <CardHeader title="Base currency" description="Changing it needs the rates below deleted first: they are stated in the base currency." />
          <BaseCurrencyForm base={base} />
        </Card>
      ) : null}
      <Card>
        <CardHeader title="Exchange rates" description={`How many ${base} one unit of each currency is worth, from a given day.`} />
        <ExchangeRates base={base} rates={rates} canEdit={canEdit} today={isoDay(new Date())} />
      </Card>
    </div>
  );
}
