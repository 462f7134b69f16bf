import { NextRequest } from "next/server";
import { getLucia } from "@/lib/auth/lucia";
import type { Role } from "@/lib/auth/roles";
import type { Models } from "@/models";
import { newUserId } from "@/scripts/demo/seed-demo";
import { uniqueName } from "./helpers";

// Calls route handlers the way Next.js does, with a real session row, so tests see exactly what a
// browser would: status, headers and body.

export const ORIGIN = "http://127.0.0.1:3000";

type RouteFn = (
  req: NextRequest,
  ctx: { params: Promise<Record<string, string | string[]>> },
) => Promise<Response>;

export interface CallOptions {
  method?: string;
  sessionId?: string | null;
  /** A string is sent as it is (malformed JSON, raw escapes), FormData as multipart, anything else as JSON. */
  body?: unknown;
  params?: Record<string, string>;
  contentType?: string;
}

export async function callRoute(fn: RouteFn, path: string, options: CallOptions = {}) {
  const { method = "GET", sessionId, body, params = {}, contentType = "application/json" } = options;
  const headers: Record<string, string> = { origin: ORIGIN, host: "127.0.0.1:3000" };
  if (sessionId) headers.cookie = `${getLucia().sessionCookieName}=${sessionId}`;
  let payload: string | FormData | undefined;
  if (body instanceof FormData) payload = body;
  else if (body !== undefined) {
    headers["content-type"] = contentType;
    payload = typeof body === "string" ? body : JSON.stringify(body);
  }
  const req = new NextRequest(`${ORIGIN}${path}`, { method, headers, body: payload });
  const response = await fn(req, { params: Promise.resolve(params) });
  const text = await response.text();
  let json: unknown = null;
  try {
    json = JSON.parse(text);
  } catch {
    json = null;
  }
  return { status: response.status, headers: response.headers, text, json };
}

/** A person of the given role in the shop, with a signed-in session. */
export async function signedInUser(models: Models, shopId: number, role: Role) {
  const user = await models.User.create({
    id: newUserId(),
    shopId,
    email: `${uniqueName(role)}@fixture.test`,
    name: `Fixture ${role}`,
    passwordHash: "not-a-real-hash",
    role,
  });
  const session = await getLucia().createSession(user.id, {});
  return { user, sessionId: session.id };
}

/** The field errors of a 400 answer, or an empty object. */
export function fieldErrorsOf(json: unknown): Record<string, string[]> {
  const error = (json as { error?: { fieldErrors?: Record<string, string[]> } } | null)?.error;
  return error?.fieldErrors ?? {};
}
