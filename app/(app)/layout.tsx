import type { ReactNode } from "react";
import { AppHeader } from "@/components/shell/app-header";
import { requireViewer } from "@/lib/auth/current";

export default async function AppLayout({ children }: { children: ReactNode }) {
  const viewer = await requireViewer();
  return (
    <div className="flex min-h-screen flex-col">
      <AppHeader viewer={viewer} />
      <main className="mx-auto w-full max-w-page flex-1 px-gutter py-8">{children}</main>
    </div>
  );
}
