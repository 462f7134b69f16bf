// State-changing requests must come from our own pages. Browsers send Origin on every POST, PUT,
// PATCH and DELETE; it has to be exactly the configured APP_ORIGIN: scheme, host and port.
// Host and X-Forwarded-Host are never consulted: they say where a request went, not where it came from.

export const STATE_CHANGING_METHODS: ReadonlySet<string> = new Set(["POST", "PUT", "PATCH", "DELETE"]);

export function isOwnOrigin(originHeader: string | null | undefined, appOrigin: string): boolean {
  if (!originHeader || originHeader === "null") return false;
  try {
    const origin = new URL(originHeader);
    // An Origin header is a scheme, a host and perhaps a port, and nothing more.
    if (origin.pathname !== "/" || origin.search || origin.hash || origin.username) return false;
    return origin.origin === new URL(appOrigin).origin;
  } catch {
    return false;
  }
}
