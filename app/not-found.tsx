import Link from "next/link";

export default function NotFound() {
  return (
    <div className="mx-auto max-w-md px-gutter py-section text-center">
      <h1 className="text-3xl font-bold">Not found</h1>
      <p className="mt-2 text-cocoa-700">There is nothing at this address.</p>
      <Link href="/" className="mt-6 inline-block font-semibold text-pod-dark underline">
        Back to Barwright
      </Link>
    </div>
  );
}
