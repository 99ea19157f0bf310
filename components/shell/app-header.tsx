import { Wordmark } from "@/components/brand/wordmark";
import { canSeeCosts } from "@/lib/auth/costs";
import type { Viewer } from "@/lib/auth/current";
import { can } from "@/lib/auth/permissions";
import { listMembershipsForUser } from "@/lib/data/memberships";
import { mailboxEnabled } from "@/lib/mail/mailbox";
import { navItems } from "./nav-items";
import { NavLinks } from "./nav-links";
import { UserMenu } from "./user-menu";
import { WorkspaceSwitcher } from "./workspace-switcher";

export async function AppHeader({ viewer }: { viewer: Viewer }) {
  const seesCosts = await canSeeCosts(viewer);
  const items = navItems
    .filter((i) => can(viewer.role, i.permission) && (!i.demoOnly || mailboxEnabled()) && (!i.costs || seesCosts))
    .map(({ href, label }) => ({ href, label }));
  const workspaces = await listMembershipsForUser({ userId: viewer.user.id });
  return (
    <header className="border-b border-sand bg-white/70 backdrop-blur">
      <div className="mx-auto flex max-w-page items-center gap-6 px-gutter py-3">
        <Wordmark href="/overview" />
        <NavLinks items={items} />
        <div className="ml-auto flex items-center gap-4">
          {/* One workspace: its name is in the account menu, and the section bar keeps the room. */}
          {workspaces.length > 1 ? (
            <WorkspaceSwitcher
              current={viewer.workspace.id}
              workspaces={workspaces.map((w) => ({ value: w.workspaceId, label: w.workspaceName }))}
            />
          ) : null}
          <UserMenu name={viewer.user.name} email={viewer.user.email} role={viewer.role} workspace={viewer.workspace.name} />
        </div>
      </div>
    </header>
  );
}
