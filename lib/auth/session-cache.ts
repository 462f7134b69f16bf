import type { Session, User } from "lucia";

/**
 * A short in-process memory of sessions Lucia has just validated, so a burst of requests with one cookie
 * (a screen's queries, autosaves while typing) reads the session and user rows once, not once each.
 *
 * What the window means: Lucia v3 validates a session by reading its row and its user's row on every call
 * (and extends it when half its life has passed). Here a valid answer is reused for at most
 * SESSION_CACHE_MS. Signing out, deactivating a person or changing their role in this process forgets
 * their sessions at once. A session ended by another app instance, or straight in the database, can still
 * be accepted by this instance for up to that window (a deactivated person keeps access, or a changed role
 * its old rights, for at most that long). A session is never reused past its own expiry, refusals are
 * never remembered, and a freshly extended session is not cached (its cookie must be sent first).
 */
export const SESSION_CACHE_MS = 5_000;
const MAX_ENTRIES = 10_000;

type Valid = { user: User; session: Session };
type Entry = { result: Valid; untilMs: number };

const store = globalThis as typeof globalThis & { chillwrightSessionCache?: Map<string, Entry> };

function entries(): Map<string, Entry> {
  store.chillwrightSessionCache ??= new Map();
  return store.chillwrightSessionCache;
}

export function recalledSession(sessionId: string, nowMs = Date.now()): Valid | null {
  const map = entries();
  const entry = map.get(sessionId);
  if (!entry) return null;
  if (entry.untilMs <= nowMs || entry.result.session.expiresAt.getTime() <= nowMs) {
    map.delete(sessionId);
    return null;
  }
  return entry.result;
}

export function rememberSession(result: Valid, nowMs = Date.now()): void {
  if (result.session.fresh) return;
  const map = entries();
  // Oldest first (insertion order): a full map drops the entry remembered longest ago.
  if (map.size >= MAX_ENTRIES) {
    const oldest = map.keys().next().value;
    if (oldest !== undefined) map.delete(oldest);
  }
  map.delete(result.session.id);
  map.set(result.session.id, {
    result,
    untilMs: Math.min(nowMs + SESSION_CACHE_MS, result.session.expiresAt.getTime()),
  });
}

/** Sign-out: this session is refused from now on in this process. */
export function forgetSession(sessionId: string): void {
  entries().delete(sessionId);
}

/** Deactivation or a new role: every remembered session of this person is read again. */
export function forgetUserSessions(userId: string): void {
  const map = entries();
  for (const [id, entry] of map) if (entry.result.user.id === userId) map.delete(id);
}
