"use client";

import { useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { deleteSupplierAction, setSupplierArchivedAction } from "@/app/(app)/suppliers/actions";
import { Button } from "@/components/ui/button";
import { Dialog } from "@/components/ui/dialog";
import { useToast } from "@/components/ui/toast";

/** Archive or restore a supplier; delete only when nothing refers to it (otherwise the reason is shown). */
export function SupplierAdmin({ id, name, archived }: { id: string; name: string; archived: boolean }) {
  const router = useRouter();
  const toast = useToast();
  const [pending, start] = useTransition();
  const [open, setOpen] = useState(false);
  const [refusal, setRefusal] = useState<string | null>(null);
  const archive = () =>
    start(async () => {
      const r = await setSupplierArchivedAction({ supplierId: id, archived: !archived });
      toast(r.ok ? { title: archived ? `${name} is restored.` : `${name} is archived.`, tone: "success" } : { title: "Not changed", description: r.message, tone: "error" });
      setOpen(false);
      router.refresh();
    });
  const remove = () =>
    start(async () => {
      const r = await deleteSupplierAction({ supplierId: id });
      if (r.ok) router.push("/suppliers");
      else setRefusal(r.message);
    });
  return (
    <div className="flex gap-2">
      <Button variant="secondary" onClick={archive} disabled={pending}>
        {archived ? "Restore" : "Archive"}
      </Button>
      <Dialog
        open={open}
        onOpenChange={(o) => {
          setOpen(o);
          if (!o) setRefusal(null);
        }}
        title={`Delete ${name}?`}
        description="Only a supplier without quotes, uploads, files or preferred-supplier choices can be deleted. Archiving keeps the history."
        trigger={<Button variant="quiet" disabled={pending}>Delete</Button>}
      >
        {refusal ? <p role="alert" className="mb-4 rounded-lg bg-brick-light px-3 py-2 text-sm text-brick">{refusal}</p> : null}
        <div className="flex justify-end gap-2">
          <Button variant="secondary" onClick={() => setOpen(false)}>Keep it</Button>
          {refusal && !archived ? (
            <Button onClick={archive} disabled={pending}>Archive instead</Button>
          ) : (
            <Button variant="danger" onClick={remove} disabled={pending}>Delete {name}</Button>
          )}
        </div>
      </Dialog>
    </div>
  );
}
