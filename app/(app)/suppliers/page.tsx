import type { Metadata } from "next";
import Link from "next/link";
import { SuppliersTable } from "@/components/suppliers/suppliers-table";
import { Button } from "@/components/ui/button";
import { requireViewer } from "@/lib/auth/current";
import { can } from "@/lib/auth/permissions";

export const metadata: Metadata = { title: "Suppliers" };

export default async function SuppliersPage() {
  const viewer = await requireViewer();
  const buyer = can(viewer.role, "suppliers.edit");
  return (
    <div className="space-y-6">
      <div className="flex flex-wrap items-end justify-between gap-4">
        <div>
          <h1 className="text-3xl font-bold">Suppliers</h1>
          <p className="mt-2 max-w-2xl text-cocoa-700">Who sells you beans, butter, sugar and the rest, in which currency and how fast.</p>
        </div>
        {buyer ? (
          <div className="flex gap-2">
            <Button asChild variant="secondary">
              <Link href="/prices/upload">Upload a price list</Link>
            </Button>
            <Button asChild>
              <Link href="/suppliers/new">New supplier</Link>
            </Button>
          </div>
        ) : null}
      </div>
      <SuppliersTable />
    </div>
  );
}
