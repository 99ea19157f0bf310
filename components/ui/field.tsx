import * as Label from "@radix-ui/react-label";
import type { ReactNode } from "react";

/** A labelled form field with an optional hint and error message. */
export function Field({
  id,
  label,
  hint,
  error,
  children,
}: {
  id: string;
  label: string;
  hint?: string;
  error?: string;
  children: ReactNode;
}) {
  return (
    <div className="flex flex-col gap-1.5">
      <Label.Root htmlFor={id} className="text-sm font-semibold text-cocoa-700">
        {label}
      </Label.Root>
      {children}
      {hint && !error ? <p className="text-xs text-cocoa-500">{hint}</p> : null}
      {error ? (
        <p id={`${id}-error`} role="alert" className="text-sm text-brick">
          {error}
        </p>
      ) : null}
    </div>
  );
}
