import { recipeListQuerySchema, type RecipeListQuery } from "@/lib/validation/recipes";

type SearchParams = Record<string, string | string[] | undefined>;

/**
 * The list's query from the address bar, leniently: a field that does not parse
 * (a hand-edited link) is dropped rather than failing the page.
 */
export function parseListQuery(searchParams: SearchParams): RecipeListQuery {
  const raw: Record<string, string> = {};
  for (const key of ["q", "type", "status", "sort", "dir", "page"]) {
    const v = searchParams[key];
    const first = Array.isArray(v) ? v[0] : v;
    if (first) raw[key] = first;
  }
  const parsed = recipeListQuerySchema.safeParse(raw);
  if (parsed.success) return parsed.data;
  const bad = new Set(parsed.error.issues.map((i) => String(i.path[0])));
  return recipeListQuerySchema.parse(Object.fromEntries(Object.entries(raw).filter(([k]) => !bad.has(k))));
}

/** The list's address with some fields changed (page back to 1 unless given). */
export function listHref(query: RecipeListQuery, change: Partial<RecipeListQuery>): string {
  const next = { ...query, page: 1, ...change };
  const params = new URLSearchParams();
  if (next.q) params.set("q", next.q);
  if (next.type) params.set("type", next.type);
  if (next.status) params.set("status", next.status);
  if (next.sort !== "updated") params.set("sort", next.sort);
  if (next.dir) params.set("dir", next.dir);
  if (next.page > 1) params.set("page", String(next.page));
  const s = params.toString();
  return s ? `/recipes?${s}` : "/recipes";
}
