import type { InputHTMLAttributes } from "react";
import { cn } from "@/lib/cn";

export const fieldClass =
  "h-10 w-full rounded-lg border border-sand bg-white px-3 text-cocoa placeholder:text-cocoa-300 " +
  "focus:border-pod focus:outline-none focus:ring-2 focus:ring-pod/30 aria-[invalid=true]:border-brick";

export function Input({ className, ...props }: InputHTMLAttributes<HTMLInputElement>) {
  return <input className={cn(fieldClass, className)} {...props} />;
}
