"use client";

import { useTransition } from "react";
import { signOutEverywhereAction } from "@/app/(app)/actions";
import { Button } from "@/components/ui/button";

export function SignOutEverywhereButton() {
  const [pending, start] = useTransition();
  return (
    <Button variant="secondary" disabled={pending} onClick={() => start(() => signOutEverywhereAction())}>
      {pending ? "Signing out…" : "Sign out everywhere"}
    </Button>
  );
}
