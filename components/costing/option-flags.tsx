import type { ComparisonCell } from "@/lib/costing";
import { cn } from "@/lib/cn";

/** A source's buying flags: warnings in brick, facts in the muted ink. */
export function OptionFlags({ cell }: { cell: ComparisonCell }) {
  const notes = [...cell.flags.map((f) => ({ text: f.message, warn: f.severity === "warn" })), ...(cell.option.problem ? [{ text: cell.option.problem, warn: true }] : [])];
  if (notes.length === 0) return null;
  return (
    <ul className="mt-1 space-y-0.5 text-right text-xs">
      {notes.map((n) => (
        <li key={n.text} className={cn(n.warn ? "text-brick" : "text-cocoa-500")} data-testid={n.warn ? "flag-warn" : "flag-info"}>
          {n.warn ? "⚠ " : ""}
          {n.text}
        </li>
      ))}
    </ul>
  );
}
