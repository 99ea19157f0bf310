import type { Metadata } from "next";
import { Badge } from "@/components/ui/badge";
import { Card, CardHeader } from "@/components/ui/card";
import { Table, Td, Th } from "@/components/ui/table";
import { requireViewer } from "@/lib/auth/current";
import { listMembers } from "@/lib/data/memberships";

export const metadata: Metadata = { title: "Overview" };

export default async function OverviewPage() {
  const viewer = await requireViewer();
  const members = await listMembers({ workspaceId: viewer.workspace.id });
  return (
    <div className="space-y-8">
      <div>
        <p className="text-sm font-semibold uppercase tracking-widest text-pod-dark">Workspace</p>
        <h1 className="mt-1 text-3xl font-bold">{viewer.workspace.name}</h1>
        <p className="mt-2 text-cocoa-700">
          Signed in as {viewer.user.name}, <span className="font-semibold">{viewer.role}</span>.
        </p>
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
