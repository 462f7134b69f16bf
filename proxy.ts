import { NextResponse, type NextRequest } from "next/server";

// Cheap checks only: the real session check happens in every page, handler and action.
const SESSION_COOKIE = "cw_session";
const PUBLIC_PAGES = ["/sign-in", "/s/", "/credits"];

export function proxy(req: NextRequest) {
  const { pathname } = req.nextUrl;

  if (req.method !== "GET" && req.method !== "HEAD" && req.method !== "OPTIONS") {
    const origin = req.headers.get("origin");
    const host = req.headers.get("x-forwarded-host") ?? req.headers.get("host");
    let sameOrigin = false;
    try {
      sameOrigin = Boolean(origin && host && new URL(origin).host === host);
    } catch {
      sameOrigin = false;
    }
    if (!sameOrigin) {
      return NextResponse.json(
        {
          error: {
            code: "forbidden:origin",
            message: "This request did not come from Chillwright's own pages.",
          },
        },
        { status: 403 },
      );
    }
    return NextResponse.next();
  }

  if (pathname.startsWith("/api/")) return NextResponse.next();
  const isPublic = PUBLIC_PAGES.some((p) => pathname === p || pathname.startsWith(p));
  if (!isPublic && !req.cookies.has(SESSION_COOKIE)) {
    const url = req.nextUrl.clone();
    url.pathname = "/sign-in";
    url.search = pathname === "/" ? "" : `?next=${encodeURIComponent(pathname + req.nextUrl.search)}`;
    return NextResponse.redirect(url);
  }
  return NextResponse.next();
}

export const config = {
  // Files anyone may fetch without a session: the favicon, the app icons and the web app manifest.
  matcher: ["/((?!_next/static|_next/image|favicon.ico|icon|apple-icon|manifest.webmanifest|robots.txt).*)"],
};
