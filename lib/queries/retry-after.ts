/**
 * Reads an HTTP Retry-After value (RFC 9110 §10.2.3: delay-seconds or an HTTP date) as milliseconds from `now`,
 * or undefined when it is missing or unreadable. A date in the past means "now" (0).
 */
export function retryAfterMs(
  header: string | null | undefined,
  now: number = Date.now(),
): number | undefined {
  if (header == null) return undefined;
  const text = header.trim();
  if (/^\d+$/.test(text)) return Number(text) * 1000;
  if (text === "" || /^[+-]?\d/.test(text)) return undefined;
  const at = Date.parse(text);
  return Number.isNaN(at) ? undefined : Math.max(0, at - now);
}

/** The server said "busy, come back later" (503) or "too many" (429): a save waits and tries again. */
export function isTryAgainStatus(status: number): boolean {
  return status === 503 || status === 429;
}

/**
 * The wait before the next try: our own doubling backoff, but never sooner than the server asked for,
 * and never longer than `maxMs` (a technician should not wait minutes for a save the server could take).
 */
export function nextRetryDelayMs(
  backoffMs: number,
  serverAskedMs: number | undefined,
  maxMs: number,
): number {
  return Math.min(maxMs, Math.max(backoffMs, serverAskedMs ?? 0));
}
