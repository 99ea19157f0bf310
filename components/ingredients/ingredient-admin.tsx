"use client";

import Link from "next/link";
import { useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { deleteIngredientAction, setIngredientArchivedAction } from "@/app/(app)/ingredients/actions";
import { Button } from "@/components/ui/button";
import { Dialog } from "@/components/ui/dialog";
import { useToast } from "@/components/ui/toast";

/** Edit, archive or restore, and delete (refused with the reason when something uses it). */
export function IngredientAdmin({ id, name, archived }: { id: string; name: string; archived: boolean }) {
  const router = useRouter();
  const toast = useToast();
  const [pending, start] = useTransition();
  const [confirming, setConfirming] = useState(false);
  const [refusal, setRefusal] = useState<string | null>(null);
  const archive = () =>
    start(async () => {
      const r = await setIngredientArchivedAction({ ingredientId: id, archived: !archived });
      toast(r.ok ? { title: archived ? `${name} is back in the library.` : `${name} is archived.`, tone: "success" } : { title: "Not changed", description: r.message, tone: "error" });
      router.refresh();
    });
  const remove = () =>
    start(async () => {
      const r = await deleteIngredientAction({ ingredientId: id });
      if (r.ok) {
        toast({ title: `${name} was deleted.`, tone: "success" });
        router.push("/ingredients");
      } else setRefusal(r.message);
    });
  return (
    <div className="flex flex-wrap gap-2">
      <Button asChild variant="secondary">
        <Link href={`/ingredients/${id}/edit`}>Edit profile</Link>
      </Button>
      <Button variant="secondary" onClick={archive} disabled={pending}>
        {archived ? "Restore" : "Archive"}
      </Button>
      <Dialog
        open={confirming}
        onOpenChange={(open) => {
          setConfirming(open);
          if (!open) setRefusal(null);
        }}
        title={`Delete ${name}?`}
        description="Only an ingredient that no recipe, quote or file uses can be deleted. Archiving keeps its history."
        trigger={<Button variant="quiet" disabled={pending}>Delete</Button>}
      >
        {refusal ? (
          <p role="alert" className="mb-4 rounded-lg bg-brick-light px-3 py-2 text-sm text-brick">
            {refusal}
          </p>
        ) : null}
        <div className="flex justify-end gap-2">
          <Button variant="secondary" onClick={() => setConfirming(false)}>
            Keep it
          </Button>
          {refusal && !archived ? (
            <Button onClick={() => { setConfirming(false); archive(); }} disabled={pending}>
              Archive instead
            </Button>
          ) : (
            <Button variant="danger" onClick={remove} disabled={pending}>
              Delete {name}
            </Button>
          )}
        </div>
      </Dialog>
    </div>
  );
}
