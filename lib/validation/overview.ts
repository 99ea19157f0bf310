import { z } from "zod";
import { isoDaySchema } from "./decimal";

/** GET /api/overview: the day to read it for (prices valid, batches overdue); today when left out. */
export const overviewQuerySchema = z.object({ on: isoDaySchema.optional() }).strict();
