import { safeReturnPath } from "@/lib/unavailable";

/**
 * GET /unavailable?from=/recipes — where pages send the browser when the
 * database cannot be reached: HTTP 503 with Retry-After, a plain explanation,
 * a link back, and a refresh that tries again by itself after 30 seconds. It
 * reads nothing from the database, so it always answers. Self-contained HTML
 * (no app chrome, which would need the session and so the database).
 */
export function GET(request: Request): Response {
  const back = safeReturnPath(new URL(request.url).searchParams.get("from"));
  const href = escapeHtml(back);
  const html = `<!doctype html>
<html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1">
<meta http-equiv="refresh" content="30;url=${href}">
<title>Database unavailable · Barwright</title>
<style>
@font-face{font-family:"Source Sans 3";src:url("/fonts/source-sans-3-latin-wght-normal.woff2") format("woff2");font-weight:200 900;font-display:swap}
body{margin:0;background:#FBF7F1;color:#2B1A12;font:17px/1.5 "Source Sans 3",system-ui,sans-serif}
main{max-width:34rem;margin:12vh auto;padding:2rem;border:1px solid #E6DACB;border-radius:12px;background:#fff}
h1{font-size:1.5rem;margin:0 0 .75rem}a{color:#9E5714;font-weight:600}p{margin:.5rem 0}small{color:#6E5647}
</style></head>
<body><main role="alert">
<h1>Barwright cannot reach its database right now</h1>
<p>Nothing you saved is lost. Try again in a minute.</p>
<p>If you were saving something when this appeared, it was either saved completely or not at all; check it once the page loads again.</p>
<p><a href="${href}">Try again</a></p>
<p><small>This page tries again by itself every 30 seconds.</small></p>
</main></body></html>`;
  return new Response(html, {
    status: 503,
    headers: { "content-type": "text/html; charset=utf-8", "retry-after": "30", "cache-control": "no-store" },
  });
}

function escapeHtml(s: string): string {
  return s.replace(/[&<>"']/g, (c) => ({ "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#39;" })[c]!);
}
