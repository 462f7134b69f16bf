import { NextResponse, type NextRequest } from "next/server";
import { env } from "@/lib/env";
import {
  API_CONTENT_SECURITY_POLICY,
  STATIC_SECURITY_HEADERS,
  STRICT_TRANSPORT_SECURITY,
  createNonce,
  pageContentSecurityPolicy,
} from "@/lib/security/headers";
import { isOwnOrigin, STATE_CHANGING_METHODS } from "@/lib/security/origin";

// Cheap checks only: the real session check happens in every page, handler and action.
// Here, for pages and server actions: the Origin check for state-changing requests, the security
// headers with a fresh CSP nonce for each page, and a redirect to sign-in when there is no session
// cookie at all. API routes are left out by the matcher: lib/server/handler.ts checks their Origin
// and sets no-store, and next.config.mjs gives them their headers, so no request pays for it twice.
const SESSION_COOKIE = "cw_session";
// Pages reached without a session. "/s/" is the owner summary (app/s/[token]): the vehicle's owner
// has no account, so the page is public and lets in only a link token that is unguessable, stored
// hashed, expiring and revocable, which the page itself checks (lib/server/share-links.ts).
const PUBLIC_PAGES = ["/sign-in", "/s/", "/credits", "/invitation/"];

export function proxy(req: NextRequest) {
  const { pathname } = req.nextUrl;
  const { APP_ORIGIN, NODE_ENV } = env();
  const https = APP_ORIGIN.startsWith("https://");

  const withHeaders = (res: NextResponse, csp: string) => {
    for (const [name, value] of Object.entries(STATIC_SECURITY_HEADERS)) res.headers.set(name, value);
    if (https) res.headers.set("Strict-Transport-Security", STRICT_TRANSPORT_SECURITY);
    res.headers.set("Content-Security-Policy", csp);
    return res;
  };

  if (STATE_CHANGING_METHODS.has(req.method) && !isOwnOrigin(req.headers.get("origin"), APP_ORIGIN)) {
    return withHeaders(
      NextResponse.json(
        {
          error: {
            code: "forbidden:origin",
            message: "This request did not come from Chillwright's own pages.",
          },
        },
        { status: 403 },
      ),
      API_CONTENT_SECURITY_POLICY,
    );
  }

  // Next.js reads the nonce from the request's CSP header and puts it on its own scripts; the
  // x-nonce request header is there for any inline script of ours (there is none today).
  const nonce = createNonce();
  const csp = pageContentSecurityPolicy({ nonce, development: NODE_ENV === "development", https });

  const isPublic = PUBLIC_PAGES.some((p) => pathname === p || pathname.startsWith(p));
  if (!isPublic && !req.cookies.has(SESSION_COOKIE) && (req.method === "GET" || req.method === "HEAD")) {
    // Built on APP_ORIGIN: the Host header is the client's to write, so it never names the target.
    const url = new URL("/sign-in", APP_ORIGIN);
    if (pathname !== "/") url.searchParams.set("next", pathname + req.nextUrl.search);
    return withHeaders(NextResponse.redirect(url), csp);
  }

  const requestHeaders = new Headers(req.headers);
  requestHeaders.set("x-nonce", nonce);
  requestHeaders.set("Content-Security-Policy", csp);
  return withHeaders(NextResponse.next({ request: { headers: requestHeaders } }), csp);
}

export const config = {
  // Left out: JSON answers under /api (see above), and files anyone may fetch without a session: the
  // favicon, the app icons and the web app manifest.
  matcher: [
    "/((?!api/|_next/static|_next/image|favicon.ico|icon|apple-icon|manifest.webmanifest|robots.txt).*)",
  ],
};
