import type { Permission } from "@/lib/auth/permissions";

/** The signed-in app's sections, in the order a maker's work flows; each shown only to roles that may use it. */
export const navItems: ReadonlyArray<{ href: string; label: string; permission: Permission; demoOnly?: boolean }> = [
  { href: "/overview", label: "Overview", permission: "workspace.read" },
  { href: "/ingredients", label: "Ingredients", permission: "ingredients.read" },
  { href: "/suppliers", label: "Suppliers", permission: "ingredients.read" },
  { href: "/prices", label: "Prices", permission: "ingredients.read" },
  { href: "/recipes", label: "Recipes", permission: "recipes.readReleased" },
  { href: "/lots", label: "Bean lots", permission: "lots.read" },
  { href: "/costing", label: "Costing", permission: "costs.read" },
  { href: "/batches", label: "Batches", permission: "batches.read" },
  { href: "/settings/members", label: "Team", permission: "workspace.read" },
  { href: "/settings/mailbox", label: "Mailbox", permission: "members.manage", demoOnly: true },
];
