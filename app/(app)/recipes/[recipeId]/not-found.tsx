import Link from "next/link";

export default function RecipeNotFound() {
  return (
    <div className="rounded-card border border-sand bg-white p-6">
      <h1 className="text-xl font-bold">That recipe or version is not here</h1>
      <p className="mt-2 text-cocoa-700">
        It may belong to another workspace, or (for production) not be released yet.{" "}
        <Link href="/recipes" className="font-semibold text-pod-dark hover:underline">
          Back to the recipes
        </Link>
      </p>
    </div>
  );
}
