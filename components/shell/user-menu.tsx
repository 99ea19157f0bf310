"use client";

import * as Menu from "@radix-ui/react-dropdown-menu";
import Link from "next/link";
import { useTransition } from "react";
import { signOutAction } from "@/app/(app)/actions";
import type { Role } from "@/db/schema";
import { can } from "@/lib/auth/permissions";

export function UserMenu({ name, email, role, workspace }: { name: string; email: string; role: Role; workspace: string }) {
  const [signingOut, startSignOut] = useTransition();
  const initials = name
    .split(/\s+/)
    .map((p) => p[0])
    .join("")
    .slice(0, 2)
    .toUpperCase();
  return (
    <Menu.Root>
      <Menu.Trigger
        aria-label={`Account menu for ${name}`}
        className="flex h-9 w-9 items-center justify-center rounded-full bg-cocoa text-sm font-bold text-cream"
      >
        {initials}
      </Menu.Trigger>
      <Menu.Portal>
        <Menu.Content align="end" sideOffset={6} className="z-50 w-64 rounded-lg border border-sand bg-white p-1 shadow-card">
          <div className="px-3 py-2">
            <p className="font-semibold">{name}</p>
            <p className="text-sm text-cocoa-500">{email}</p>
            <p className="mt-2 text-sm" data-testid="account-menu-workspace">
              {workspace}
            </p>
            <p className="text-xs uppercase tracking-wide text-pod-dark">{role}</p>
          </div>
          <Menu.Separator className="my-1 h-px bg-sand" />
          <Menu.Item asChild>
            <Link href="/settings/account" className="block rounded-md px-3 py-2 text-sm outline-none data-[highlighted]:bg-cream-deep">
              Your account
            </Link>
          </Menu.Item>
          {/* Kept out of the section bar, which is full once the workspace menu shows. */}
          {can(role, "workspace.export") ? (
            <Menu.Item asChild>
              <Link href="/settings/workspace" className="block rounded-md px-3 py-2 text-sm outline-none data-[highlighted]:bg-cream-deep">
                Workspace: backup and move
              </Link>
            </Menu.Item>
          ) : null}
          <Menu.Item
            disabled={signingOut}
            onSelect={() => startSignOut(() => signOutAction())}
            className="cursor-pointer rounded-md px-3 py-2 text-sm outline-none data-[highlighted]:bg-cream-deep"
          >
            {signingOut ? "Signing out…" : "Sign out"}
          </Menu.Item>
        </Menu.Content>
      </Menu.Portal>
    </Menu.Root>
  );
}
