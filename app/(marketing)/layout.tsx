import type { ReactNode } from "react";
import { Wordmark } from "@/components/brand/wordmark";
import { Button } from "@/components/ui/button";
import Link from "next/link";

export default function MarketingLayout({ children }: { children: ReactNode }) {
  return (
    <div className="flex min-h-screen flex-col">
      <header className="mx-auto flex w-full max-w-page items-center justify-between px-gutter py-5">
        <Wordmark />
        <Button asChild variant="secondary" size="sm">
          <Link href="/sign-in">Sign in</Link>
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
