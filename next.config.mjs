// The same values as STATIC_SECURITY_HEADERS in lib/security/headers.ts (a unit test compares them):
// proxy.ts sets them with the per-request CSP on pages; these cover API answers, the built files under
// /_next/static and anything else the proxy's matcher leaves out.
const staticSecurityHeaders = [
  { key: "X-Frame-Options", value: "DENY" },
  { key: "X-Content-Type-Options", value: "nosniff" },
  { key: "Referrer-Policy", value: "same-origin" },
  {
    key: "Permissions-Policy",
    value:
      "camera=(self), microphone=(), geolocation=(), payment=(), usb=(), serial=(), hid=(), " +
      "midi=(), accelerometer=(), gyroscope=(), magnetometer=(), display-capture=(), fullscreen=(), " +
      "publickey-credentials-get=(), screen-wake-lock=(), xr-spatial-tracking=(), autoplay=(), " +
      "encrypted-media=(), picture-in-picture=(), idle-detection=(), browsing-topics=()",
  },
  { key: "Cross-Origin-Opener-Policy", value: "same-origin" },
];

// JSON answers under /api: the proxy's matcher leaves them out (running it cost every API request more
// than the route's own work), so their policy and no-store come from here, with the static headers
// above. The same values as API_CONTENT_SECURITY_POLICY and API_CACHE_CONTROL in
// lib/security/headers.ts (a unit test compares them); lib/server/handler.ts sets no-store as well.
const apiHeaders = [
  { key: "Content-Security-Policy", value: "default-src 'none'; frame-ancestors 'none'; base-uri 'none'" },
  { key: "Cache-Control", value: "no-store" },
];

/** @type {import('next').NextConfig} */
const nextConfig = {
  // Native or dynamic-require packages stay out of the server bundle.
  serverExternalPackages: [
    "sequelize",
    "mariadb",
    "mysql2",
    "@node-rs/argon2",
    "umzug",
    "rate-limiter-flexible",
    "pdfkit",
  ],
  poweredByHeader: false,
  // `npm test` runs `tsc --noEmit` over the whole project before it builds; checking twice costs minutes.
  typescript: { ignoreBuildErrors: true },
  reactStrictMode: true,
  experimental: { authInterrupts: true },
  async headers() {
    return [
      { source: "/:path*", headers: staticSecurityHeaders },
      { source: "/api/:path*", headers: apiHeaders },
    ];
  },
};

export default nextConfig;
