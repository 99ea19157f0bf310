import "server-only";
import { notFound } from "next/navigation";
import { AppError } from "@/lib/errors";

/** A data function's result, or the route's not-found page when it says "not found". */
export async function orNotFound<T>(load: Promise<T>): Promise<T> {
  try {
    return await load;
  } catch (err) {
    if (err instanceof AppError && err.code === "not_found") notFound();
    throw err;
  }
}

/** A route's id segment, or the not-found page when it is not a UUID (never a database error). */
export function pageId(id: string): string {
  if (!/^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i.test(id)) notFound();
  return id;
}
