import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { Card } from "@/components/ui/card";
import { requireViewer } from "@/lib/auth/current";
import { can } from "@/lib/auth/permissions";
import { listCapturedMail, mailboxEnabled } from "@/lib/mail/mailbox";

export const metadata: Metadata = { title: "Demo mailbox" };

const linkPattern = /(https?:\/\/[^\s]+)/g;

/** Owner-only, demo-only: the messages the local SMTP sink captured, with clickable links. */
export default async function MailboxPage() {
  const viewer = await requireViewer();
  if (!mailboxEnabled() || !can(viewer.role, "members.manage")) notFound();
  const mails = await listCapturedMail();
  return (
    <div className="space-y-6">
      <div>
        <h1 className="text-3xl font-bold">Demo mailbox</h1>
        <p className="mt-2 text-cocoa-700">
          In the demo, Barwright&apos;s e-mails go to a local mail catcher instead of real inboxes. Newest first.
        </p>
      </div>
      {mails.length === 0 ? <p className="text-cocoa-500">No message yet. Invite someone from Team.</p> : null}
      {mails.map((m) => (
        <Card key={m.id} data-testid="captured-mail">
          <p className="text-sm text-cocoa-500">
            To {m.to} · {new Date(m.receivedAt).toLocaleString("en-GB")}
          </p>
          <h2 className="mt-1 text-lg font-bold">{m.subject}</h2>
          <div className="mt-3 whitespace-pre-wrap text-[0.95rem] text-cocoa-700">
            {m.text.split(linkPattern).map((part, i) =>
              /^https?:\/\//.test(part) ? (
                <a key={i} href={part} className="break-all font-semibold text-pod-dark underline">
                  {part}
                </a>
              ) : (
                <span key={i}>{part}</span>
              ),
            )}
          </div>
        </Card>
      ))}
    </div>
  );
}
