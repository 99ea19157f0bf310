import Link from "next/link";

export default function BatchNotFound() {
  return (
    <div className="space-y-2">
      <h1 className="text-2xl font-bold">Batch not found</h1>
      <p className="text-cocoa-700">
        It may belong to another workspace. <Link href="/batches" className="underline">All batches</Link>
      </p>
    </div>
  );
}
