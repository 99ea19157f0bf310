import type { Metadata } from "next";
import { ChangePasswordForm } from "@/components/account/change-password-form";
import { SignOutEverywhereButton } from "@/components/account/sign-out-everywhere-button";
import { Card, CardHeader } from "@/components/ui/card";
import { requireViewer } from "@/lib/auth/current";
import { authSettings } from "@/lib/auth/settings";

export const metadata: Metadata = { title: "Your account" };

export default async function AccountPage() {
  const viewer = await requireViewer();
  return (
    <div className="max-w-2xl space-y-8">
      <div>
        <h1 className="text-3xl font-bold">Your account</h1>
        <p className="mt-2 text-cocoa-700">
          {viewer.user.name} · {viewer.user.email}
        </p>
      </div>
      <Card>
        <CardHeader title="Change password" description="Every other device where you are signed in is signed out." />
        <ChangePasswordForm />
      </Card>
      <Card>
        <CardHeader
          title="Sign out everywhere"
          description={`Ends every session of yours, on every device, including this one. Sessions also end after ${authSettings.idleTimeoutMinutes / 60} hours without use and ${authSettings.absoluteLifetimeMinutes / (60 * 24)} days after sign-in.`}
        />
        <SignOutEverywhereButton />
      </Card>
    </div>
  );
}
