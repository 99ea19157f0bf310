import Link from "next/link";
import { cn } from "@/lib/cn";

/** Previous / next links and where we are; the server sends only the page shown. */
export function Pagination({ page, pageCount, total, href }: { page: number; pageCount: number; total: number; href: (page: number) => string }) {
  const link = "rounded-md border border-sand bg-white px-3 py-1.5 text-sm font-semibold hover:bg-cream-deep";
  const off = "pointer-events-none opacity-40";
  return (
    <nav aria-label="Pages" className="flex items-center justify-between gap-3 text-sm">
      <p className="text-cocoa-500">
        <span className="figures">{total.toLocaleString("en-GB")}</span> {total === 1 ? "recipe" : "recipes"} · page{" "}
        <span className="figures">{page.toLocaleString("en-GB")}</span> of <span className="figures">{pageCount.toLocaleString("en-GB")}</span>
      </p>
      <div className="flex gap-2">
        <Link href={href(page - 1)} aria-disabled={page <= 1} className={cn(link, page <= 1 && off)} rel="prev">
          Previous
        </Link>
        <Link href={href(page + 1)} aria-disabled={page >= pageCount} className={cn(link, page >= pageCount && off)} rel="next">
          Next
        </Link>
      </div>
    </nav>
  );
}
