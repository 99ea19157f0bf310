import type { InputHTMLAttributes } from "react";
import { cn } from "@/lib/cn";
import { fieldClass } from "./input";

/**
 * A numeric input with its unit always shown and figures right-aligned. Kept as
 * text (inputMode decimal) so "70.0" or "0.35" are never reformatted by the browser.
 */
export function NumberField({
  unit,
  className,
  ...props
}: Omit<InputHTMLAttributes<HTMLInputElement>, "type"> & { unit: string }) {
  return (
    <div className="relative">
      <input
        type="text"
        inputMode="decimal"
        autoComplete="off"
        className={cn(fieldClass, "figures pr-12 text-right", className)}
        {...props}
      />
      <span className="pointer-events-none absolute inset-y-0 right-3 flex items-center text-sm text-cocoa-500">
        {unit}
      </span>
    </div>
  );
}
