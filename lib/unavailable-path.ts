/**
 * Request header proxy.ts sets to the path (and query) a page request asked
 * for, so a page that finds the database down can send the browser back there
 * from /unavailable. Its own file: proxy.ts cannot import server-only modules.
 */
export const PATH_HEADER = "x-barwright-path";
