import Link from "next/link";

/** "Showing 5 of 12 — all on <page>" under a shortened list; nothing when every row is shown. */
export function FewFooter({ shown, total, href, where }: { shown: number; total: number; href: string; where: string }) {
  if (total <= shown) return null;
  return (
    <p className="mt-3 text-sm text-cocoa-500">
      {shown} of {total} shown ·{" "}
      <Link href={href} className="font-semibold text-pod-dark hover:underline">
        all on {where}
      </Link>
    </p>
  );
}
