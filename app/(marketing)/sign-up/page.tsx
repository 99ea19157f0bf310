import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { getPageViewer } from "@/lib/auth/current";
import { SignUpForm } from "./sign-up-form";

export const metadata: Metadata = { title: "Create a workspace" };

export default async function SignUpPage() {
  if (await getPageViewer()) redirect("/overview");
  return (
    <div className="mx-auto max-w-md px-gutter py-section">
      <h1 className="text-3xl font-bold">Create a workspace</h1>
      <p className="mt-2 text-cocoa-700">
        A workspace holds one chocolate business&apos;s recipes, suppliers and batches. You will be its owner and can
        invite your team.
      </p>
      <div className="mt-8 rounded-card border border-sand bg-white p-6 shadow-card">
        <SignUpForm />
      </div>
    </div>
  );
}
