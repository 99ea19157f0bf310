import type { Role } from "@/db/schema";

/**
 * Who may do what, as data. Deny by default: an action not listed here, or a
 * role not listed for it, is refused. Every server action and route handler
 * names one of these permissions (see lib/actions/define-action.ts and
 * lib/api/route.ts); the integration test matrix checks each against this table.
 */
export const permissionTable = {
  /** See the workspace, its people, the overview. */
  "workspace.read": ["owner", "formulator", "buyer", "production", "viewer"],
  /** Change one's own password. */
  "account.manage": ["owner", "formulator", "buyer", "production", "viewer"],
  /** Invite, revoke invitations, change roles, remove members, read the demo mailbox. */
  "members.manage": ["owner"],
} as const satisfies Record<string, readonly Role[]>;

export type Permission = keyof typeof permissionTable;

export const allPermissions = Object.keys(permissionTable) as Permission[];

/** Whether a role holds a permission (pure; usable in the UI to hide controls). */
export function can(role: Role | null | undefined, permission: Permission): boolean {
  if (!role) return false;
  const allowed: readonly Role[] | undefined = permissionTable[permission];
  return allowed !== undefined && allowed.includes(role);
}
