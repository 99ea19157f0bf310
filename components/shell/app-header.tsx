import { Wordmark } from "@/components/brand/wordmark";
import type { Viewer } from "@/lib/auth/current";
import { NavLinks } from "./nav-links";
import { UserMenu } from "./user-menu";

export function AppHeader({ viewer }: { viewer: Viewer }) {
  return (
    <header className="border-b border-sand bg-white/70 backdrop-blur">
      <div className="mx-auto flex max-w-page items-center gap-8 px-gutter py-3">
        <Wordmark href="/overview" />
        <NavLinks />
        <div className="ml-auto flex items-center gap-4">
          <span className="hidden text-sm text-cocoa-500 md:inline" data-testid="workspace-name">
            {viewer.workspace.name}
          </span>
          <UserMenu name={viewer.user.name} email={viewer.user.email} role={viewer.role} />
        </div>
      </div>
    </header>
  );
}
