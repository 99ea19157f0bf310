import type { ReactNode } from "react";
import { Wordmark } from "@/components/brand/wordmark";
import { Button } from "@/components/ui/button";
import Link from "next/link";
import { getViewer } from "@/lib/auth/current";

/** Who is signed in, if anyone; the public pages still render when the database is away. */
async function signedIn() {
  try {
    return await getViewer();
  } catch {
    return null;
  }
}

export default async function MarketingLayout({ children }: { children: ReactNode }) {
  const viewer = await signedIn();
  return (
    <div className="flex min-h-screen flex-col">
      <header className="mx-auto flex w-full max-w-page items-center justify-between px-gutter py-5">
        <Wordmark />
        <Button asChild variant="secondary" size="sm">
          {viewer ? <Link href="/overview">Open {viewer.workspace.name}</Link> : <Link href="/sign-in">Sign in</Link>}
        </Button>
      </header>
      <main className="flex-1">{children}</main>
      <footer className="border-t border-sand py-6 text-center text-sm text-cocoa-500">
        Barwright — software for small chocolate makers. Legal names, labels and food-safety steps must be checked
        against your local regulations.
      </footer>
    </div>
  );
}
