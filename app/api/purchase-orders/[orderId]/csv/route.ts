import { z } from "zod";
import { apiRoute } from "@/lib/api/route";
import { routeId } from "@/lib/api/route-id";
import { csvResponse } from "@/lib/csv/export";
import { getPurchaseOrder } from "@/lib/data/purchase-orders";
import { orderCsv, orderFileName } from "@/lib/purchasing/order-document";

/** GET /api/purchase-orders/:orderId/csv — the order as the supplier receives it. */
export const GET = apiRoute({
  permission: "purchases.manage",
  schema: z.object({}).strict(),
  handler: async ({ viewer, params }) => {
    const order = await getPurchaseOrder({ workspaceId: viewer.workspace.id, orderId: routeId(params.orderId, "That purchase order") });
    return csvResponse(orderCsv(order), orderFileName(order));
  },
});
