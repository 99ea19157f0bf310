import type { ReactNode } from "react";
import { requireViewer } from "@/lib/auth/current";
import "./print.css";

/** Bare pages for paper: no header, no navigation; each page checks its own permission. */
export default async function PrintLayout({ children }: { children: ReactNode }) {
  await requireViewer();
  return <div className="print-root mx-auto max-w-[210mm] bg-white px-6 py-6 text-[10.5pt] leading-snug text-cocoa print:max-w-none print:p-0">{children}</div>;
}
