"use client";

import { Button } from "@/components/ui/button";

export default function SectionError({ reset }: { error: Error; reset: () => void }) {
  return (
    <div role="alert" className="rounded-panel border-2 border-danger-600 bg-danger-100 p-6">
      <h1 className="text-xl">This page could not be loaded</h1>
      <p className="mt-2">Nothing you saved was changed. Try again; if it keeps failing, tell whoever runs your Spanwright.</p>
      <Button className="mt-4" onClick={reset}>
        Try again
      </Button>
    </div>
  );
}
