"use client";

import { useRouter } from "next/navigation";
import { useTransition } from "react";
import { setPreferredSupplierAction } from "@/app/(app)/ingredients/actions";
import { refreshLists } from "@/components/data/fetch-json";
import { Select, type SelectOption } from "@/components/ui/select";
import { useToast } from "@/components/ui/toast";

/** The buyer's choice of whose current price costs this ingredient. */
export function PreferredSupplier({ ingredientId, value, suppliers }: { ingredientId: string; value: string | null; suppliers: SelectOption[] }) {
  const router = useRouter();
  const toast = useToast();
  const [pending, start] = useTransition();
  return (
    <div className="w-80" aria-busy={pending}>
      <Select
        value={value ?? "none"}
        ariaLabel="Preferred supplier"
        options={[{ value: "none", label: "No preferred supplier" }, ...suppliers]}
        onValueChange={(supplierId) =>
          start(async () => {
            const r = await setPreferredSupplierAction({ ingredientId, supplierId });
            toast(r.ok ? { title: "Preferred supplier saved.", tone: "success" } : { title: "Not changed", description: r.message, tone: "error" });
            await refreshLists("/api/ingredients");
            router.refresh();
          })
        }
      />
    </div>
  );
}
