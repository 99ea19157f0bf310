"use client";

import { useEffect, useState } from "react";
import { Button } from "@/components/ui/button";

type Database = "checking" | "up" | "down";

/**
 * A page of the app failed. In a production build the error's message never
 * reaches the browser (only a digest), so the page asks /api/health whether
 * the database is the cause: if it is, it says so plainly; otherwise it is
 * our bug. Never shows a stack trace either way.
 */
export default function AppError({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  const [database, setDatabase] = useState<Database>("checking");

  useEffect(() => {
    const ask = new AbortController();
    const timer = setTimeout(() => ask.abort(), 4_000);
    fetch("/api/health", { cache: "no-store", signal: ask.signal })
      .then((res) => setDatabase(res.ok ? "up" : "down"))
      .catch(() => setDatabase("down"))
      .finally(() => clearTimeout(timer));
    return () => {
      clearTimeout(timer);
      ask.abort();
    };
  }, [error]);

  if (database === "down") {
    return (
      <div role="alert" className="rounded-card border border-brick/40 bg-brick-light p-6">
        <h1 className="text-xl font-bold text-brick">Barwright cannot reach its database right now</h1>
        <p className="mt-2 text-cocoa-700">Nothing you saved is lost. Try again in a minute.</p>
        <Button className="mt-4" onClick={reset}>
          Try again
        </Button>
      </div>
    );
  }
  return (
    <div role="alert" aria-busy={database === "checking"} className="rounded-card border border-brick/40 bg-brick-light p-6">
      <h1 className="text-xl font-bold text-brick">Something went wrong on our side</h1>
      <p className="mt-2 text-cocoa-700">Nothing you entered was lost. Try again; if it keeps happening, tell whoever runs Barwright for you.</p>
      {error.digest ? <p className="mt-2 text-xs text-cocoa-500">Reference: {error.digest}</p> : null}
      <Button className="mt-4" onClick={reset}>
        Try again
      </Button>
    </div>
  );
}
