import type { Metadata } from "next";
import { ResetPasswordForm } from "./reset-password-form";

export const metadata: Metadata = { title: "Choose a new password" };

export default async function ResetPasswordPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  return (
    <div className="mx-auto max-w-md px-gutter py-section">
      <h1 className="text-3xl font-bold">Choose a new password</h1>
      <p className="mt-2 text-cocoa-700">This signs you out on every device.</p>
      <div className="mt-8 rounded-card border border-sand bg-white p-6 shadow-card">
        <ResetPasswordForm token={token} />
      </div>
    </div>
  );
}
