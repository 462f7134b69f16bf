import "server-only";
import { cache } from "react";
import { cookies } from "next/headers";
import type { Session, User } from "lucia";
import { getLucia } from "./lucia";
import { forgetSession, recalledSession, rememberSession } from "./session-cache";

export type SessionResult = { user: User; session: Session } | { user: null; session: null };

/** Validates a session id and drops sessions of deactivated users (briefly remembered: ./session-cache.ts). */
export async function validateSessionId(sessionId: string | null | undefined): Promise<SessionResult> {
  if (!sessionId) return { user: null, session: null };
  const recalled = recalledSession(sessionId);
  if (recalled) return recalled;
  const result = await getLucia().validateSession(sessionId);
  if (result.user && !result.user.active) {
    forgetSession(result.session.id);
    await getLucia().invalidateSession(result.session.id);
    return { user: null, session: null };
  }
  if (result.session) rememberSession(result);
  return result;
}

/** For server components and server actions: reads the cookie through next/headers, once per request. */
export const validateRequest = cache(async (): Promise<SessionResult> => {
  const cookieStore = await cookies();
  const lucia = getLucia();
  const sessionId = cookieStore.get(lucia.sessionCookieName)?.value ?? null;
  const result = await validateSessionId(sessionId);
  // Server components cannot set cookies; route handlers and actions refresh them instead.
  try {
    if (result.session?.fresh) {
      const cookie = lucia.createSessionCookie(result.session.id);
      cookieStore.set(cookie.name, cookie.value, cookie.attributes);
    }
    if (!result.session && sessionId) {
      const cookie = lucia.createBlankSessionCookie();
      cookieStore.set(cookie.name, cookie.value, cookie.attributes);
    }
  } catch {
    // Rendering a page: setting cookies is not allowed there, and not needed.
  }
  return result;
});
