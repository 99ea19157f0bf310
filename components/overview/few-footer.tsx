import Link from "next/link";

/** "5 of 12 shown · open <page>" under a shortened list (the page where such rows are worked on); nothing when every row is shown. */
export function FewFooter({ shown, total, href, where }: { shown: number; total: number; href: string; where: string }) {
  if (total <= shown) return null;
  return (
    <p className="mt-3 text-sm text-cocoa-500">
      {shown} of {total} shown ·{" "}
      <Link href={href} className="font-semibold text-pod-dark hover:underline">
        open {where}
      </Link>
    </p>
  );
}
