import type { Permission } from "@/lib/auth/permissions";

/**
 * The signed-in app's sections, in the order a maker's work flows; each shown only to roles that may use it.
 * `costs`: shown only to those who may see costs (lib/auth/costs.ts: the cost roles, or everyone when the owner shares them).
 */
export const navItems: ReadonlyArray<{ href: string; label: string; permission: Permission; demoOnly?: boolean; costs?: boolean }> = [
  { href: "/overview", label: "Overview", permission: "workspace.read" },
  { href: "/ingredients", label: "Ingredients", permission: "ingredients.read" },
  { href: "/suppliers", label: "Suppliers", permission: "ingredients.read" },
  { href: "/prices", label: "Prices", permission: "ingredients.read", costs: true },
  { href: "/recipes", label: "Recipes", permission: "recipes.readReleased" },
  { href: "/lots", label: "Bean lots", permission: "lots.read" },
  { href: "/costing", label: "Costing", permission: "workspace.read", costs: true },
  { href: "/batches", label: "Batches", permission: "batches.read" },
  { href: "/settings/members", label: "Team", permission: "workspace.read" },
  { href: "/settings/mailbox", label: "Mailbox", permission: "members.manage", demoOnly: true },
];
