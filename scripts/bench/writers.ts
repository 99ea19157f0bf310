/**
 * The save phase of the load benchmark: 20 connections, each a writer that
 * owns its own recipes (every 20th of the first 2,000) and saves new versions
 * on them in turn through POST /api/recipes/:id/versions, always from the
 * version it last saved, so no save should ever conflict. It counts the saves
 * the server acknowledged per recipe, for the check afterwards.
 */
import type { Client, Request } from "autocannon";
import type { ChocolateType } from "../../db/schema/recipes";
import { GENERATED_TYPES, formulations } from "./generate";
import { LARGE, type LargeWorkspace } from "./big-workspace";

export const WRITERS = 20;
const RECIPES_PER_WRITER = 100;

export type WriterLedger = { acknowledged: Map<string, number>; refused: { status: number; body: string }[] };

/** The body lines of a type's pool formulation `n`, with this workspace's ingredient ids. */
export function linesFor(ws: LargeWorkspace, type: ChocolateType, n: number) {
  const list = formulations(type, LARGE.pool, LARGE.variants);
  return list[n % list.length]!.map((l) => ({ ingredientId: ws.ingredientIds.get(l.key)![l.variant]!, percent: l.percent }));
}

export function writerSetup(ws: LargeWorkspace, cookies: string[], origin: string, ledger: WriterLedger): (client: Client) => void {
  let next = 0;
  return (client) => {
    const writer = next++ % WRITERS;
    const type = GENERATED_TYPES[writer % GENERATED_TYPES.length]!;
    const seqs = Array.from({ length: RECIPES_PER_WRITER }, (_, k) => writer + k * WRITERS);
    const base = new Map(seqs.map((s) => [s, LARGE.versionsEach]));
    let turn = 0;
    let current = seqs[0]!;
    const request: Request = {
      method: "POST",
      headers: { "content-type": "application/json", cookie: cookies[writer]!, origin },
      setupRequest: (req) => {
        current = seqs[turn % seqs.length]!;
        const body = { baseVersionNo: base.get(current)!, barMassGrams: "70", note: `Load test save ${turn + 1}`, lines: linesFor(ws, type, writer + turn) };
        turn++;
        return { ...req, path: `/api/recipes/${ws.recipeIds[current]}/versions`, body: JSON.stringify(body) };
      },
      onResponse: (status, body) => {
        if (status === 201) {
          const saved = JSON.parse(body) as { versionNo: number };
          base.set(current, saved.versionNo);
          const id = ws.recipeIds[current]!;
          ledger.acknowledged.set(id, (ledger.acknowledged.get(id) ?? 0) + 1);
        } else {
          ledger.refused.push({ status, body: body.slice(0, 300) });
        }
      },
    };
    client.setRequests([request]);
  };
}
