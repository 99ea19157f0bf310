import type { Metadata } from "next";
import { NotAllowed } from "@/components/forms/not-allowed";
import { SupplierForm } from "@/components/suppliers/supplier-form";
import { Card } from "@/components/ui/card";
import { requireViewer } from "@/lib/auth/current";
import { can } from "@/lib/auth/permissions";

export const metadata: Metadata = { title: "New supplier" };

export default async function NewSupplierPage() {
  const viewer = await requireViewer();
  return (
    <div className="space-y-6">
      <h1 className="text-3xl font-bold">New supplier</h1>
      {can(viewer.role, "suppliers.edit") ? (
        <Card>
          <SupplierForm />
        </Card>
      ) : (
        <NotAllowed what="add suppliers" who="Owners and buyers" />
      )}
    </div>
  );
}
