import { Card } from "@/components/ui/card";

/** What production and viewers see on a costing page while the owner has not shared costs. */
export function CostsNotAllowed() {
  return (
    <Card className="max-w-xl" data-testid="costs-not-allowed">
      <h1 className="text-xl font-bold">Costs are not shared with your role</h1>
      <p className="mt-2 text-sm text-cocoa-700">
        Costs, prices and margins are for the owner, the buyer and the formulator. The owner can share them with everyone on the Costing page.
      </p>
    </Card>
  );
}
