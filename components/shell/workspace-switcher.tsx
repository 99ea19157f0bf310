"use client";

import { useRouter } from "next/navigation";
import { useTransition } from "react";
import { switchWorkspaceAction } from "@/app/(app)/actions";
import { Select, type SelectOption } from "@/components/ui/select";
import { useToast } from "@/components/ui/toast";

export function WorkspaceSwitcher({ current, workspaces }: { current: string; workspaces: SelectOption[] }) {
  const router = useRouter();
  const toast = useToast();
  const [, start] = useTransition();
  return (
    <div className="w-36 shrink-0" data-testid="workspace-switcher">
      <Select
        value={current}
        ariaLabel="Workspace"
        options={workspaces}
        onValueChange={(workspaceId) =>
          start(async () => {
            const r = await switchWorkspaceAction({ workspaceId });
            if (r.ok) router.push("/overview");
            else toast({ title: "Could not switch", description: r.message, tone: "error" });
          })
        }
      />
    </div>
  );
}
