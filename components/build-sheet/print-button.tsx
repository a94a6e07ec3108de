"use client";

import { Button } from "@/components/ui/button";

/** Opens the browser's print dialog (the sheet has its own print layout: one build type per page). */
export function PrintButton() {
  return (
    <Button type="button" variant="secondary" onClick={() => window.print()}>
      Print
    </Button>
  );
}
