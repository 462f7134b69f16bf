// Cookie settings that depend on where the app is served.

const LOOPBACK_HOSTS = new Set(["127.0.0.1", "localhost", "[::1]"]);

/**
 * Cookies carry `Secure` everywhere except plain-HTTP local development on this machine
 * (http://127.0.0.1, http://localhost): a browser would drop a Secure cookie there.
 */
export function secureCookies(appOrigin: string): boolean {
  const url = new URL(appOrigin);
  return !(url.protocol === "http:" && LOOPBACK_HOSTS.has(url.hostname));
}
