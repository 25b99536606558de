"use client";

import { Button } from "@/components/ui/button";

/** Opens the browser's print dialog for the card. */
export function PrintButton() {
  return (
    <Button tone="primary" onClick={() => window.print()}>
      Print
    </Button>
  );
}
