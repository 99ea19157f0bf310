import type { Role } from "@/db/schema";

const everyone = ["owner", "formulator", "buyer", "production", "viewer"] as const;

/**
 * Who may do what, as data. Deny by default: an action not listed here, or a
 * role not listed for it, is refused. Every server action and route handler
 * names one of these permissions (see lib/actions/define-action.ts and
 * lib/api/route.ts); the integration test matrix checks each against this table.
 */
export const permissionTable = {
  /** See the workspace, its people, the overview. */
  "workspace.read": everyone,
  /** Change one's own password. */
  "account.manage": everyone,
  /** Invite, revoke invitations, change roles, remove members, read the demo mailbox. */
  "members.manage": ["owner"],
  /** Download the whole workspace as one file (every table, people without passwords, files). */
  "workspace.export": ["owner"],
  /** Make a new workspace from an export file (the importer becomes its owner). */
  "workspace.import": ["owner"],

  /** Read the ingredient library, suppliers, quotes and rates. */
  "ingredients.read": everyone,
  /** Create, edit and archive ingredients and their files. */
  "ingredients.edit": ["owner", "formulator"],
  /** Create, edit and archive suppliers, enter quotes and exchange rates, upload price lists. */
  "suppliers.edit": ["owner", "buyer"],

  /** Read every version of every recipe, with composition and cost. */
  "recipes.read": ["owner", "formulator", "buyer", "viewer"],
  /** Read released versions only (what production works from). */
  "recipes.readReleased": everyone,
  /** Create recipes, save versions, restore, fork and release. */
  "recipes.edit": ["owner", "formulator"],

  /** Read bean lots and their yield chains. */
  "lots.read": everyone,
  /** Create bean lots and their prices. */
  "lots.edit": ["owner", "buyer"],
  /** Record sorting, roasting, cracking and winnowing. */
  "lots.process": ["owner", "production"],

  /** Read batches, their sheets' figures, runs and traceability, machines and scales. */
  "batches.read": everyone,
  /** Plan batches from released versions, print batch sheets, record runs. */
  "batches.plan": ["owner", "production"],
  /** Material requirements into purchase orders: draft, send, receive, cancel. */
  "purchases.manage": ["owner", "buyer"],
  /** Add and retire machines and weighing stations. */
  "machines.manage": ["owner", "production"],

  /**
   * See cost settings, supplier comparisons and margins. Production and viewers
   * also may when the owner turns on the workspace's "show costs to everyone"
   * setting: that is checked in lib/auth/costs.ts, never here.
   */
  "costs.read": ["owner", "buyer", "formulator"],
  /** Change cost settings and the chosen supplier of each ingredient. */
  "costs.edit": ["owner", "buyer"],
} as const satisfies Record<string, readonly Role[]>;

export type Permission = keyof typeof permissionTable;

export const allPermissions = Object.keys(permissionTable) as Permission[];

/** Whether a role holds a permission (pure; usable in the UI to hide controls). */
export function can(role: Role | null | undefined, permission: Permission): boolean {
  if (!role) return false;
  const allowed: readonly Role[] | undefined = permissionTable[permission];
  return allowed !== undefined && allowed.includes(role);
}
