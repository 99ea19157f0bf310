"use client";

import { useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { cancelBatchAction } from "@/app/(app)/batches/actions";
import { Button } from "@/components/ui/button";

export function CancelBatchButton({ batchId }: { batchId: string }) {
  const router = useRouter();
  const [error, setError] = useState<string | null>(null);
  const [pending, start] = useTransition();
  return (
    <span className="inline-flex items-center gap-2">
      <Button
        variant="secondary"
        disabled={pending}
        onClick={() =>
          start(async () => {
            if (!window.confirm("Cancel this batch? Its plan stays on record.")) return;
            const r = await cancelBatchAction({ batchId });
            if (r.ok) router.refresh();
            else setError(r.message);
          })
        }
      >
        Cancel batch
      </Button>
      {error ? <span role="alert" className="text-sm text-brick">{error}</span> : null}
    </span>
  );
}
