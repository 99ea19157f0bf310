/**
 * Integration tests call server actions and route handlers directly. Outside a
 * Next.js request there is no cookie jar, header list or cache to revalidate,
 * so these three framework entry points are replaced by in-memory ones that
 * tests drive (tests/support/request.ts). Everything else — sessions, the
 * database, permissions, mail — is real.
 */
import { vi } from "vitest";
import { requestState } from "../support/request";

vi.mock("next/headers", () => ({
  cookies: async () => requestState.cookieStore,
  headers: async () => requestState.headers,
}));

vi.mock("next/cache", () => ({
  revalidatePath: (path: string) => requestState.revalidated.push(path),
  revalidateTag: (tag: string) => requestState.revalidated.push(`tag:${tag}`),
}));
