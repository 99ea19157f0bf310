"use client";

import { Button } from "@/components/ui/button";

/** Opens the browser's print dialog; hidden on paper. */
export function PrintButton() {
  return (
    <Button className="print:hidden" onClick={() => window.print()}>
      Print
    </Button>
  );
}
