import type { Metadata } from "next";
import Link from "next/link";
import { invitationStateMessage } from "@/lib/auth/accounts";
import { hashToken } from "@/lib/auth/tokens";
import { getInvitationByTokenHash } from "@/lib/data/invitations";
import { getUserByEmail } from "@/lib/data/users";
import { AcceptInvitationForm } from "./accept-invitation-form";

export const metadata: Metadata = { title: "Join a workspace" };

export default async function InvitationPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const inv = /^[A-Za-z0-9_-]{20,100}$/.test(token) ? await getInvitationByTokenHash({ tokenHash: hashToken(token) }) : null;
  return (
    <div className="mx-auto max-w-md px-gutter py-section">
      {!inv || inv.state !== "pending" ? (
        <div role="alert" data-testid="invitation-problem">
          <h1 className="text-3xl font-bold">This invitation cannot be used</h1>
          <p className="mt-2 text-cocoa-700">{inv ? invitationStateMessage(inv.state) : "This invitation link is not valid."}</p>
          <Link href="/sign-in" className="mt-6 inline-block font-semibold text-pod-dark underline">
            Go to sign-in
          </Link>
        </div>
      ) : (
        <>
          <h1 className="text-3xl font-bold">Join {inv.workspaceName}</h1>
          <p className="mt-2 text-cocoa-700">
            You are invited as <span className="font-semibold">{inv.role}</span>, with the address {inv.email}.
          </p>
          <div className="mt-8 rounded-card border border-sand bg-white p-6 shadow-card">
            <AcceptInvitationForm token={token} hasAccount={!!(await getUserByEmail({ email: inv.email }))} />
          </div>
        </>
      )}
    </div>
  );
}
