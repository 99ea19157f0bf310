import type { HTMLAttributes, TdHTMLAttributes, ThHTMLAttributes } from "react";
import { cn } from "@/lib/cn";

export function Table({ className, ...props }: HTMLAttributes<HTMLTableElement>) {
  // Positioned, so that visually hidden header text (sr-only, absolute) stays inside the scrolling box instead of widening the page.
  return (
    <div className="relative overflow-x-auto rounded-card border border-sand bg-white">
      <table className={cn("w-full border-collapse text-sm", className)} {...props} />
    </div>
  );
}

export function Th({ className, numeric, ...props }: ThHTMLAttributes<HTMLTableCellElement> & { numeric?: boolean }) {
  return (
    <th
      scope="col"
      className={cn(
        "border-b border-sand bg-cream-deep px-4 py-2.5 text-left text-xs font-semibold uppercase tracking-wide text-cocoa-500",
        numeric && "text-right",
        className,
      )}
      {...props}
    />
  );
}

/** A table cell; `numeric` right-aligns with tabular figures and keeps a figure with its unit on one line. */
export function Td({ className, numeric, ...props }: TdHTMLAttributes<HTMLTableCellElement> & { numeric?: boolean }) {
  return (
    <td
      className={cn("border-b border-sand-light px-4 py-2.5", numeric && "figures whitespace-nowrap text-right", className)}
      {...props}
    />
  );
}
