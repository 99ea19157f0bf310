import "server-only";
import { z } from "zod";
import { notFound } from "@/lib/errors";

const uuid = z.string().uuid();

/** A route's id segment, or a 404 naming the thing (a malformed id is simply not found). */
export function routeId(value: string | string[] | undefined, what: string): string {
  const parsed = uuid.safeParse(value);
  if (!parsed.success) throw notFound(what);
  return parsed.data;
}
