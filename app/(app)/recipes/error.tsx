"use client";

import { Button } from "@/components/ui/button";

/**
 * A recipes page that broke. Refusals never land here: the pages check the role
 * first and show a 404 or a read-only view instead.
 */
export default function RecipesError({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return (
    <div role="alert" className="rounded-card border border-brick/40 bg-brick-light p-6">
      <h1 className="text-xl font-bold text-brick">Something went wrong on our side</h1>
      <p className="mt-2 text-cocoa-700">
        Nothing saved was lost, and an unsaved draft on the bench is kept in this browser. Try again; if it keeps happening,
        the database may be unavailable.
      </p>
      {error.digest ? <p className="mt-2 text-xs text-cocoa-500">Reference: {error.digest}</p> : null}
      <Button className="mt-4" onClick={reset}>
        Try again
      </Button>
    </div>
  );
}
