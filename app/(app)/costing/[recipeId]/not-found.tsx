import Link from "next/link";
import { Card } from "@/components/ui/card";

export default function CostingNotFound() {
  return (
    <Card className="max-w-xl">
      <h1 className="text-xl font-bold">Nothing to cost here</h1>
      <p className="mt-2 text-sm text-cocoa-700">That recipe or version is not in this workspace, or the recipe has no saved version yet.</p>
      <Link href="/costing" className="mt-4 inline-block text-sm font-semibold text-pod-dark hover:underline">
        Back to costing
      </Link>
    </Card>
  );
}
