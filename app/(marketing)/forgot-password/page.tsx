import type { Metadata } from "next";
import { RequestResetForm } from "./request-reset-form";

export const metadata: Metadata = { title: "Reset your password" };

export default function ForgotPasswordPage() {
  return (
    <div className="mx-auto max-w-md px-gutter py-section">
      <h1 className="text-3xl font-bold">Reset your password</h1>
      <p className="mt-2 text-cocoa-700">We will e-mail you a link that works once, within an hour.</p>
      <div className="mt-8 rounded-card border border-sand bg-white p-6 shadow-card">
        <RequestResetForm />
      </div>
    </div>
  );
}
