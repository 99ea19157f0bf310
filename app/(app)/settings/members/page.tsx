import type { Metadata } from "next";
import { InviteForm } from "@/components/members/invite-form";
import { MemberRoleControls } from "@/components/members/member-role-controls";
import { RevokeInvitationButton } from "@/components/members/revoke-invitation-button";
import { Badge } from "@/components/ui/badge";
import { Card, CardHeader } from "@/components/ui/card";
import { Table, Td, Th } from "@/components/ui/table";
import { requireViewer } from "@/lib/auth/current";
import { can } from "@/lib/auth/permissions";
import { listPendingInvitations } from "@/lib/data/invitations";
import { listMembers } from "@/lib/data/memberships";

export const metadata: Metadata = { title: "Team" };

const dateFormat = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "short", year: "numeric" });

export default async function MembersPage() {
  const viewer = await requireViewer();
  const manage = can(viewer.role, "members.manage");
  const [members, pending] = await Promise.all([
    listMembers({ workspaceId: viewer.workspace.id }),
    manage ? listPendingInvitations({ workspaceId: viewer.workspace.id }) : Promise.resolve([]),
  ]);
  return (
    <div className="space-y-8">
      <div>
        <h1 className="text-3xl font-bold">Team</h1>
        <p className="mt-2 text-cocoa-700">
          Owners manage people. Formulators edit recipes and ingredients, buyers suppliers and prices, production
          prints and records batches, viewers read.
        </p>
      </div>
      <Card>
        <CardHeader title="People" description={`${members.length} with access to ${viewer.workspace.name}.`} />
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
              <tr key={m.userId} data-testid={`member-${m.email}`}>
                <Td className="font-semibold">
                  {m.name}
                  {m.userId === viewer.user.id ? <span className="ml-2 text-xs text-cocoa-500">(you)</span> : null}
                </Td>
                <Td>{m.email}</Td>
                <Td>
                  {manage ? (
                    <MemberRoleControls userId={m.userId} name={m.name} role={m.role} />
                  ) : (
                    <Badge tone={m.role === "owner" ? "accent" : "neutral"}>{m.role}</Badge>
                  )}
                </Td>
              </tr>
            ))}
          </tbody>
        </Table>
      </Card>
      {manage ? (
        <>
          <Card>
            <CardHeader title="Invite someone" description="They get an e-mail with a link that works for 7 days." />
            <InviteForm />
          </Card>
          <Card>
            <CardHeader title="Waiting invitations" />
            {pending.length === 0 ? (
              <p className="text-sm text-cocoa-500">No invitation is waiting.</p>
            ) : (
              <Table>
                <thead>
                  <tr>
                    <Th>E-mail</Th>
                    <Th>Role</Th>
                    <Th>Expires</Th>
                    <Th />
                  </tr>
                </thead>
                <tbody>
                  {pending.map((p) => (
                    <tr key={p.id}>
                      <Td>{p.email}</Td>
                      <Td>{p.role}</Td>
                      <Td>{dateFormat.format(p.expiresAt)}</Td>
                      <Td className="text-right">
                        <RevokeInvitationButton invitationId={p.id} email={p.email} />
                      </Td>
                    </tr>
                  ))}
                </tbody>
              </Table>
            )}
          </Card>
        </>
      ) : null}
    </div>
  );
}
