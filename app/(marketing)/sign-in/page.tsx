import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { getPageViewer } from "@/lib/auth/current";
import { SignInForm } from "./sign-in-form";

export const metadata: Metadata = { title: "Sign in" };

export default async function SignInPage() {
  if (await getPageViewer()) redirect("/overview");
  return (
    <div className="mx-auto max-w-md px-gutter py-section">
      <h1 className="text-3xl font-bold">Sign in</h1>
      <p className="mt-2 text-cocoa-700">Use the e-mail address and password of your Barwright account.</p>
      <div className="mt-8 rounded-card border border-sand bg-white p-6 shadow-card">
        <SignInForm />
      </div>
    </div>
  );
}
