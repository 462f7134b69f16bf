// How long something has waited, in the words a queue shows: whole minutes under an hour, hours and
// minutes under a day, whole days after that. Never negative (a clock a little ahead reads "just now").

const MINUTE_MS = 60_000;
const HOUR_MS = 60 * MINUTE_MS;
const DAY_MS = 24 * HOUR_MS;

export function waitedFor(sinceMs: number, nowMs: number): string {
  const waitedMs = Math.max(0, nowMs - sinceMs);
  if (waitedMs < MINUTE_MS) return "under a minute";
  if (waitedMs < HOUR_MS) return `${Math.floor(waitedMs / MINUTE_MS)} min`;
  if (waitedMs < DAY_MS) {
    const hours = Math.floor(waitedMs / HOUR_MS);
    const minutes = Math.floor((waitedMs % HOUR_MS) / MINUTE_MS);
    return minutes === 0 ? `${hours} h` : `${hours} h ${minutes} min`;
  }
  const days = Math.floor(waitedMs / DAY_MS);
  return days === 1 ? "1 day" : `${days} days`;
}

/** The queue's one line: how many wait, and for how long the oldest has. */
export function queueSentence(count: number, oldestSinceMs: number | null, nowMs: number): string {
  if (count === 0 || oldestSinceMs === null) return "Nothing is waiting for sign-off.";
  const cases = count === 1 ? "1 case waits" : `${count} cases wait`;
  return count === 1
    ? `${cases}, for ${waitedFor(oldestSinceMs, nowMs)}.`
    : `${cases}; the oldest for ${waitedFor(oldestSinceMs, nowMs)}.`;
}
