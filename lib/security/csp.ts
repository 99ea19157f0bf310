/**
 * Barwright's Content-Security-Policy. Scripts need this request's nonce
 * ('strict-dynamic' lets Next.js's own chunks load); styles allow inline
 * attributes because server-rendered charts and popovers carry style="…"
 * (a style cannot run code). Nothing may frame the app. 'wasm-unsafe-eval' lets
 * pages compile WebAssembly (the bench's least-cost solver, HiGHS) and nothing
 * else: JavaScript eval stays refused outside development.
 */
export function contentSecurityPolicy(nonce: string, opts: { dev: boolean; https: boolean }): string {
  const directives = [
    "default-src 'self'",
    `script-src 'self' 'nonce-${nonce}' 'strict-dynamic' 'wasm-unsafe-eval'${opts.dev ? " 'unsafe-eval'" : ""}`,
    "style-src 'self' 'unsafe-inline'",
    "img-src 'self' blob: data:",
    "font-src 'self'",
    "connect-src 'self'",
    "object-src 'none'",
    "base-uri 'self'",
    "form-action 'self'",
    "frame-ancestors 'none'",
    ...(opts.https ? ["upgrade-insecure-requests"] : []),
  ];
  return directives.join("; ");
}

/** Headers every response carries (pages, route handlers, static files). */
export const staticSecurityHeaders: { key: string; value: string }[] = [
  { key: "X-Content-Type-Options", value: "nosniff" },
  { key: "Referrer-Policy", value: "strict-origin-when-cross-origin" },
  { key: "X-Frame-Options", value: "DENY" },
  { key: "Permissions-Policy", value: "camera=(), microphone=(), geolocation=(), payment=(), usb=(), interest-cohort=()" },
];
