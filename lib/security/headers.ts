// The security headers every response carries. Pure: proxy.ts applies them to pages and API
// answers, next.config.mjs repeats the static ones for files the proxy never sees.

/** Powerful browser features: the camera for photos taken on the phone, nothing else. */
export const PERMISSIONS_POLICY = [
  "camera=(self)",
  "microphone=()",
  "geolocation=()",
  "payment=()",
  "usb=()",
  "serial=()",
  "hid=()",
  "midi=()",
  "accelerometer=()",
  "gyroscope=()",
  "magnetometer=()",
  "display-capture=()",
  "fullscreen=()",
  "publickey-credentials-get=()",
  "screen-wake-lock=()",
  "xr-spatial-tracking=()",
  "autoplay=()",
  "encrypted-media=()",
  "picture-in-picture=()",
  "idle-detection=()",
  "browsing-topics=()",
].join(", ");

/** Headers that do not change per request. */
export const STATIC_SECURITY_HEADERS: Readonly<Record<string, string>> = {
  "X-Frame-Options": "DENY",
  "X-Content-Type-Options": "nosniff",
  // Stricter than strict-origin-when-cross-origin: other sites get no referrer at all (an owner's
  // link carries its token in the path). Same-origin requests keep theirs, and with it the Origin
  // header our state-changing routes require.
  "Referrer-Policy": "same-origin",
  "Permissions-Policy": PERMISSIONS_POLICY,
  "Cross-Origin-Opener-Policy": "same-origin",
};

/** One year of HTTPS-only, sent only when the app is served over HTTPS. */
export const STRICT_TRANSPORT_SECURITY = "max-age=31536000";

/** 16 random bytes, base64: a fresh nonce for each page. */
export function createNonce(): string {
  const bytes = new Uint8Array(16);
  crypto.getRandomValues(bytes);
  return btoa(String.fromCharCode(...bytes));
}

/**
 * The policy for pages: scripts only with this response's nonce (and what they load), styles from
 * our own files or with the nonce, images from our own origin and blob: previews of photos being
 * uploaded, requests only to our own origin, no plugins, no framing, no foreign form targets.
 */
export function pageContentSecurityPolicy({
  nonce,
  development,
  https,
}: {
  nonce: string;
  development: boolean;
  https: boolean;
}): string {
  const directives = [
    "default-src 'self'",
    // React in development rebuilds server error stacks with eval; production never needs it.
    `script-src 'self' 'nonce-${nonce}' 'strict-dynamic'${development ? " 'unsafe-eval'" : ""}`,
    `style-src 'self' 'nonce-${nonce}'${development ? " 'unsafe-inline'" : ""}`,
    // React's style={…} props arrive as style="…" attributes in server HTML (a suspect's score
    // bar): without this the browser drops them. Attributes cannot load or run anything; <style>
    // elements still need the nonce.
    "style-src-attr 'unsafe-inline'",
    "img-src 'self' blob: data:",
    "media-src 'self' blob:",
    "font-src 'self'",
    "connect-src 'self'",
    "manifest-src 'self'",
    "worker-src 'self'",
    "object-src 'none'",
    "base-uri 'none'",
    "form-action 'self'",
    "frame-src 'none'",
    "frame-ancestors 'none'",
  ];
  if (https) directives.push("upgrade-insecure-requests");
  return directives.join("; ");
}

/** JSON answers are never rendered as documents: nothing may load, nothing may frame them. */
export const API_CONTENT_SECURITY_POLICY = "default-src 'none'; frame-ancestors 'none'; base-uri 'none'";

/** API answers hold one shop's data: no browser or proxy cache keeps them. */
export const API_CACHE_CONTROL = "no-store";
