import "server-only";
import { NextResponse, type NextRequest } from "next/server";
import type { User } from "lucia";
import { z } from "zod";
import { getLucia } from "@/lib/auth/lucia";
import { validateSessionId } from "@/lib/auth/session";
import { can, type Permission } from "@/lib/auth/roles";
import { env } from "@/lib/env";
import { isDatabaseUnavailable } from "@/lib/db/unavailable";
import { AppError, isAppError, type MarkedErrorText } from "@/lib/errors";
import { hasQuantityMarkers, sayInUnits } from "@/lib/units/quantity";
import { API_CACHE_CONTROL, STRICT_TRANSPORT_SECURITY } from "@/lib/security/headers";
import { isOwnOrigin, STATE_CHANGING_METHODS } from "@/lib/security/origin";
import { fieldErrorsOf } from "@/lib/validation";
import { illFormedTextPath, JSON_BODY_MESSAGES, jsonDepth, MAX_JSON_DEPTH } from "@/lib/contracts/json-body";

const MAX_BODY_BYTES = 1_000_000;
/** How long a client waits before sending again while the database is away (a restart takes seconds). */
export const DATABASE_RETRY_AFTER_S = 5;
const DATABASE_UNAVAILABLE_MESSAGE =
  "The shop's database is not answering just now. Nothing you entered was lost; it can be sent again in a few seconds.";

type Schema = z.ZodType | undefined;
type Infer<S extends Schema> = S extends z.ZodType ? z.infer<S> : undefined;

interface HandlerConfig<B extends Schema, Q extends Schema, P extends Schema> {
  /** Route-level permission; omit only together with `public: true`. */
  permission?: Permission;
  public?: boolean;
  body?: B;
  query?: Q;
  params?: P;
}

export interface HandlerContext<B extends Schema, Q extends Schema, P extends Schema, U> {
  req: NextRequest;
  user: U;
  body: Infer<B>;
  query: Infer<Q>;
  params: Infer<P>;
  /** Headers to add to the JSON response (e.g. Retry-After, Set-Cookie). */
  responseHeaders: Headers;
}

type RouteContext = { params: Promise<Record<string, string | string[]>> };

/**
 * Every route handler goes through here, in this order: origin check for state-changing
 * requests (403) → session (401) → route-level role (403) → zod on params, query and body (400
 * with field errors) → the handler, which loads shop-scoped rows (404) and may refuse (403/409).
 * Unexpected errors are logged and answered with a generic 500 that never echoes internals.
 */
export function handler<
  B extends Schema = undefined,
  Q extends Schema = undefined,
  P extends Schema = undefined,
>(
  config: HandlerConfig<B, Q, P> & { public: true },
  fn: (ctx: HandlerContext<B, Q, P, User | null>) => Promise<unknown>,
): (req: NextRequest, ctx: RouteContext) => Promise<Response>;
export function handler<
  B extends Schema = undefined,
  Q extends Schema = undefined,
  P extends Schema = undefined,
>(
  config: HandlerConfig<B, Q, P> & { permission: Permission },
  fn: (ctx: HandlerContext<B, Q, P, User>) => Promise<unknown>,
): (req: NextRequest, ctx: RouteContext) => Promise<Response>;
export function handler<B extends Schema, Q extends Schema, P extends Schema>(
  config: HandlerConfig<B, Q, P>,
  fn: (ctx: HandlerContext<B, Q, P, User>) => Promise<unknown>,
) {
  return async (req: NextRequest, routeCtx: RouteContext): Promise<Response> => {
    // Answers hold one shop's data: never kept by a browser or proxy cache.
    const responseHeaders = new Headers({ "Cache-Control": API_CACHE_CONTROL });
    // The proxy never sees API requests (proxy.ts): HTTPS-only is announced here for them.
    if (env().APP_ORIGIN.startsWith("https://"))
      responseHeaders.set("Strict-Transport-Security", STRICT_TRANSPORT_SECURITY);
    try {
      if (STATE_CHANGING_METHODS.has(req.method)) checkOrigin(req);

      const lucia = getLucia();
      const sessionId = req.cookies.get(lucia.sessionCookieName)?.value ?? null;
      const { user, session } = await validateSessionId(sessionId);
      if (session?.fresh)
        responseHeaders.append("Set-Cookie", lucia.createSessionCookie(session.id).serialize());
      if (!session && sessionId)
        responseHeaders.append("Set-Cookie", lucia.createBlankSessionCookie().serialize());

      if (!config.public) {
        if (!user) throw new AppError("unauthorized:session");
        if (config.permission && !can(user.role, config.permission))
          throw new AppError(`forbidden:${config.permission.split(":")[0]}`);
      }

      const params = parse(config.params, await routeCtx.params, "params");
      const query = parse(config.query, Object.fromEntries(req.nextUrl.searchParams), "query");
      const body = config.body ? parse(config.body, await readJson(req), "body") : undefined;

      // A public handler may see a null user; the overloads keep that visible to its author.
      const result = await fn({ req, user, body, query, params, responseHeaders } as HandlerContext<
        B,
        Q,
        P,
        User
      >);
      if (result instanceof Response) {
        responseHeaders.forEach((value, key) =>
          key === "cache-control" ? result.headers.set(key, value) : result.headers.append(key, value),
        );
        return result;
      }
      return NextResponse.json(result ?? { ok: true }, { headers: responseHeaders });
    } catch (error) {
      return errorResponse(error, responseHeaders);
    }
  };
}

/** The Origin header must be exactly APP_ORIGIN; Host and X-Forwarded-Host play no part. */
function checkOrigin(req: NextRequest) {
  if (!isOwnOrigin(req.headers.get("origin"), env().APP_ORIGIN)) {
    throw new AppError("forbidden:origin", "This request did not come from Chillwright's own pages.");
  }
}

async function readJson(req: NextRequest): Promise<unknown> {
  const type = req.headers.get("content-type") ?? "";
  if (!type.toLowerCase().includes("application/json")) throw new AppError("unsupported_media_type:body");
  const length = Number(req.headers.get("content-length") ?? 0);
  if (length > MAX_BODY_BYTES) throw new AppError("payload_too_large:body");
  const text = await req.text();
  if (text.length > MAX_BODY_BYTES) throw new AppError("payload_too_large:body");
  // Counted on the raw text, before anything recursive (the parser, zod, the database) sees it.
  if (jsonDepth(text, MAX_JSON_DEPTH) > MAX_JSON_DEPTH)
    throw new AppError("bad_request:body", JSON_BODY_MESSAGES.tooDeep);
  let value: unknown;
  try {
    value = JSON.parse(text);
  } catch {
    throw new AppError("bad_request:body", "The request body is not valid JSON.");
  }
  // "\ud800" escapes decode to lone surrogates that no schema or column can hold: refuse them anywhere.
  const illFormedAt = illFormedTextPath(value);
  if (illFormedAt !== null) {
    throw new AppError("bad_request:body", "Some values need attention.", {
      fieldErrors: { [illFormedAt]: [JSON_BODY_MESSAGES.illFormed] },
    });
  }
  return value;
}

function parse<S extends Schema>(schema: S, value: unknown, where: string): Infer<S> {
  if (!schema) return undefined as Infer<S>;
  const result = schema.safeParse(value);
  if (!result.success) {
    throw new AppError(`bad_request:${where}`, "Some values need attention.", {
      fieldErrors: fieldErrorsOf(result.error),
    });
  }
  return result.data as Infer<S>;
}

/**
 * An error as the API answers it. Messages written once with quantity markers (a schema's limit) are
 * said in SI, the product's own units, so any caller reads a sentence; `marked` keeps the marked
 * wording beside it, so our screens can say it again in their reader's units.
 */
export function errorBody(error: AppError) {
  const body = error.toJSON();
  const { message, fieldErrors } = body.error;
  const markedFields = Object.entries(fieldErrors ?? {}).filter(([, list]) => list.some(hasQuantityMarkers));
  const marked: MarkedErrorText = {
    ...(hasQuantityMarkers(message) ? { message } : {}),
    ...(markedFields.length ? { fieldErrors: Object.fromEntries(markedFields) } : {}),
  };
  return {
    error: {
      ...body.error,
      message: sayInUnits(message),
      ...(fieldErrors
        ? {
            fieldErrors: Object.fromEntries(
              Object.entries(fieldErrors).map(([field, list]) => [field, list.map((m) => sayInUnits(m))]),
            ),
          }
        : {}),
      ...(marked.message !== undefined || marked.fieldErrors ? { marked } : {}),
    },
  };
}

export function errorResponse(error: unknown, headers = new Headers()): Response {
  if (isAppError(error)) {
    for (const [key, value] of Object.entries(error.headers ?? {})) headers.set(key, value);
    return NextResponse.json(errorBody(error), { status: error.status, headers });
  }
  const name = (error as { name?: string } | null)?.name;
  if (name === "SequelizeUniqueConstraintError") {
    return NextResponse.json(new AppError("conflict:unique", "That already exists.").toJSON(), {
      status: 409,
      headers,
    });
  }
  if (isDatabaseUnavailable(error)) {
    // Stopped, restarting or out of connections: the client keeps what was typed and sends it again.
    console.error("Database unavailable", (error as Error).message);
    headers.set("Retry-After", String(DATABASE_RETRY_AFTER_S));
    return NextResponse.json(new AppError("unavailable:database", DATABASE_UNAVAILABLE_MESSAGE).toJSON(), {
      status: 503,
      headers,
    });
  }
  console.error("Unhandled error in route handler", error);
  return NextResponse.json(
    {
      error: {
        code: "internal",
        message: "Something went wrong on our side. Nothing you entered was lost; try again.",
      },
    },
    { status: 500, headers },
  );
}
