import type { Metadata } from "next";
import { BeansCard } from "@/components/overview/beans-card";
import { MarginsCard } from "@/components/overview/margins-card";
import { ProductionCard } from "@/components/overview/production-card";
import { QuotesCard } from "@/components/overview/quotes-card";
import { SetupCard } from "@/components/overview/setup-card";
import { UnreleasedCard } from "@/components/overview/recipes-card";
import { Badge } from "@/components/ui/badge";
import { Card, CardHeader } from "@/components/ui/card";
import { Table, Td, Th } from "@/components/ui/table";
import { requireViewer } from "@/lib/auth/current";
import { getOverviewForViewer } from "@/lib/cost-visibility/overview";
import { listMembers } from "@/lib/data/memberships";
import { formatDate } from "@/lib/format";
import { isoDay } from "@/lib/pricing/convert";

export const metadata: Metadata = { title: "Overview" };

/** What is waiting on the team today, by role (lib/cost-visibility/overview.ts), and who is in the workspace. */
export default async function OverviewPage() {
  const viewer = await requireViewer();
  const [overview, members] = await Promise.all([getOverviewForViewer({ viewer, on: isoDay(new Date()) }), listMembers({ workspaceId: viewer.workspace.id })]);
  return (
    <div className="space-y-8">
      <div>
        <p className="text-sm font-semibold uppercase tracking-widest text-pod-dark">Workspace</p>
        <h1 className="mt-1 text-3xl font-bold">{viewer.workspace.name}</h1>
        <p className="mt-2 text-cocoa-700">
          Signed in as {viewer.user.name}, <span className="font-semibold">{viewer.role}</span>. As of {formatDate(overview.on)}.
        </p>
      </div>
      <div className="grid grid-cols-1 gap-6 lg:grid-cols-2">
        {overview.setup ? <SetupCard setup={overview.setup} /> : null}
        {overview.margins ? <MarginsCard margins={overview.margins} /> : null}
        <ProductionCard batches={overview.batches} orders={overview.orders} />
        <BeansCard beans={overview.beans} />
        {overview.unreleased ? <UnreleasedCard recipes={overview.unreleased} /> : null}
        {overview.quotes ? <QuotesCard quotes={overview.quotes} /> : null}
      </div>
      <Card>
        <CardHeader title="People" description="Everyone with access to this workspace and what they may do." />
        <Table>
          <thead>
            <tr>
              <Th>Name</Th>
              <Th>E-mail</Th>
              <Th>Role</Th>
            </tr>
          </thead>
          <tbody>
            {members.map((m) => (
              <tr key={m.userId}>
                <Td className="font-semibold">{m.name}</Td>
                <Td>{m.email}</Td>
                <Td>
                  <Badge tone={m.role === "owner" ? "accent" : "neutral"}>{m.role}</Badge>
                </Td>
              </tr>
            ))}
          </tbody>
        </Table>
      </Card>
    </div>
  );
}
