"use client";

import useSWR from "swr";

export type Preview = {
  recipe: { name: string };
  versionNo: number;
  totalMassGrams: string;
  requestedMassGrams: string;
  resolutionGrams: string;
  lines: { position: number; ingredientName: string; percent: string; massGrams: string }[];
  loads: string[];
  notes: string[];
};

type ErrorBody = { error?: { message?: string; fieldErrors?: Record<string, string[]> } };

/** A preview that failed for a reason the planner can fix (422, 404) carries that reason. */
async function fetchPreview(url: string): Promise<{ ok: true; preview: Preview } | { ok: false; message: string }> {
  const res = await fetch(url, { headers: { accept: "application/json" } });
  const body = (await res.json().catch(() => null)) as (Preview & ErrorBody) | null;
  if (res.ok && body) return { ok: true, preview: body };
  const fields = body?.error?.fieldErrors ?? {};
  return { ok: false, message: Object.values(fields).flat()[0] ?? body?.error?.message ?? `The preview failed (${res.status}).` };
}

/** The batch as it would be planned, fetched while the planner types (nothing is saved). */
export function useBatchPreview(fields: { recipeId: string; amount: string; unit: string; stationId: string; machineId: string }) {
  const ready = fields.recipeId && fields.amount.trim() && fields.stationId;
  const query = new URLSearchParams({
    recipeId: fields.recipeId,
    amount: fields.amount.trim().replace(",", "."),
    unit: fields.unit,
    stationId: fields.stationId,
    ...(fields.machineId ? { machineId: fields.machineId } : {}),
  });
  const { data, isLoading } = useSWR(ready ? `/api/batches/preview?${query}` : null, fetchPreview, { keepPreviousData: true });
  return { result: ready ? data : undefined, loading: isLoading };
}
