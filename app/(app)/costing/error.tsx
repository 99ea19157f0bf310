"use client";

import { Button } from "@/components/ui/button";

/**
 * A costing page that broke. Refusals never land here: a role that may not see
 * costs gets a "not shared with your role" page, a missing recipe a 404.
 */
export default function CostingError({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return (
    <div role="alert" className="rounded-card border border-brick/40 bg-brick-light p-6">
      <h1 className="text-xl font-bold text-brick">Something went wrong on our side</h1>
      <p className="mt-2 text-cocoa-700">Nothing saved was lost. Try again; if it keeps happening, the database may be unavailable.</p>
      {error.digest ? <p className="mt-2 text-xs text-cocoa-500">Reference: {error.digest}</p> : null}
      <Button className="mt-4" onClick={reset}>
        Try again
      </Button>
    </div>
  );
}
