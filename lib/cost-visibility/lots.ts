import "server-only";
import { canSeeCosts } from "@/lib/auth/costs";
import type { Viewer } from "@/lib/auth/current";
import { getLotDetail, listLots, type LotListItem, type NibCost } from "@/lib/data/lots";

type LotDetail = Awaited<ReturnType<typeof getLotDetail>>;

/** A lot row as the viewer may see it: no nib cost when costs are not shared with them. */
export type VisibleLotListItem = Omit<LotListItem, "nibCost"> & { nibCost: NibCost | null };

/**
 * A lot's page as the viewer may see it. Without costs: no price paid, no
 * extra cost lines, no processing costs, no nib cost — the masses and the
 * yield chain stay.
 */
export type VisibleLotDetail = Omit<LotDetail, "lot" | "nibCost" | "processingCost"> & {
  lot: Omit<LotDetail["lot"], "pricePaid"> & { pricePaid: string | null };
  nibCost: NibCost | null;
  processingCost: string | null;
  costsShown: boolean;
};

export function withoutLotListMoney(lots: LotListItem[]): VisibleLotListItem[] {
  return lots.map((l) => ({ ...l, nibCost: null }));
}

export function withoutLotMoney(detail: LotDetail): VisibleLotDetail {
  return {
    ...detail,
    lot: { ...detail.lot, pricePaid: null },
    costs: [],
    records: detail.records.map((r) => ({ ...r, record: { ...r.record, cost: null } })),
    nibCost: null,
    processingCost: null,
    costsShown: false,
  };
}

/** The workspace's lots for the lots page and GET /api/lots, money only for those who may see costs. */
export async function listLotsForViewer({ viewer }: { viewer: Viewer }): Promise<{ lots: VisibleLotListItem[]; costsShown: boolean }> {
  const [lots, costsShown] = await Promise.all([listLots({ workspaceId: viewer.workspace.id }), canSeeCosts(viewer)]);
  return { lots: costsShown ? lots : withoutLotListMoney(lots), costsShown };
}

/** One lot for its page and GET /api/lots/:lotId, money only for those who may see costs. */
export async function getLotForViewer({ viewer, lotId }: { viewer: Viewer; lotId: string }): Promise<VisibleLotDetail> {
  const [detail, costsShown] = await Promise.all([getLotDetail({ workspaceId: viewer.workspace.id, lotId }), canSeeCosts(viewer)]);
  return costsShown ? { ...detail, costsShown } : withoutLotMoney(detail);
}
