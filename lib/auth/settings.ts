/**
 * Session settings (OWASP ASVS 5.0 7.3.1 idle timeout, 7.3.2 absolute lifetime).
 * Defaults suit a working day at the bench: 12 hours idle, 7 days absolute.
 * Cookies are Secure with the __Host- prefix when BARWRIGHT_ORIGIN is https.
 */
function minutes(name: string, fallback: number): number {
  const raw = process.env[name];
  const n = raw === undefined ? NaN : Number(raw);
  return Number.isInteger(n) && n > 0 ? n : fallback;
}

const secureCookies = (process.env.BARWRIGHT_ORIGIN ?? "").startsWith("https://");

export const authSettings = {
  idleTimeoutMinutes: minutes("BARWRIGHT_SESSION_IDLE_MINUTES", 12 * 60),
  absoluteLifetimeMinutes: minutes("BARWRIGHT_SESSION_MAX_MINUTES", 7 * 24 * 60),
  secureCookies,
  cookieName: secureCookies ? "__Host-barwright_session" : "barwright_session",
} as const;
