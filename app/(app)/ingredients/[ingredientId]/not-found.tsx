import Link from "next/link";

export default function IngredientNotFound() {
  return (
    <div className="rounded-card border border-sand bg-white p-6">
      <h1 className="text-xl font-bold">No such ingredient</h1>
      <p className="mt-2 text-cocoa-700">It may have been deleted, or it belongs to another workspace.</p>
      <Link href="/ingredients" className="mt-4 inline-block font-semibold text-pod-dark hover:underline">
        Back to the ingredient library
      </Link>
    </div>
  );
}
