"use client";

import { Button } from "@/components/ui/button";

/** Opens the browser's print dialog; the page's print styles lay it out on A4. */
export function PrintButton() {
  return (
    <Button variant="secondary" className="no-print" onClick={() => window.print()}>
      Print (A4)
    </Button>
  );
}
