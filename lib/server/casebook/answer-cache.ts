import "server-only";
import { getModels } from "@/models";
import { casebookVersion } from "@/lib/db/casebook-version";

/**
 * Casebook answers (a page of search results, a case's similar cases) remembered in this process under
 * the shop, the shop's casebook version and the exact question. The version is read from the database on
 * every request (one primary-key read), and every change to a case raises it in the change's own
 * transaction (lib/db/casebook-refresh.ts), so no instance serves an answer older than the last committed
 * change. The shop id comes from the signed-in user, never from the request, and leads every key: one
 * shop's answer cannot be found under another's.
 *
 * Things the casebook shows that do not pass through a case change (a technician's renamed display name)
 * can lag by at most ANSWER_TTL_MS.
 */
export const ANSWER_TTL_MS = 30_000;
const MAX_ANSWERS = 1_000;

type Entry = { value: unknown; untilMs: number };
const store = globalThis as typeof globalThis & { chillwrightCasebookAnswers?: Map<string, Entry> };

function answers(): Map<string, Entry> {
  store.chillwrightCasebookAnswers ??= new Map();
  return store.chillwrightCasebookAnswers;
}

/** The header that tells a benchmark (or a curious developer) whether an answer came from memory. */
export const ANSWER_CACHE_HEADER = "X-Casebook-Cache";

/**
 * `caseId`: the answer also depends on that case as it is now (a draft's similar cases are read from its
 * interview, which autosaves change without touching the casebook), so its row version joins the key.
 */
export async function rememberedAnswer<T>(
  { shopId, question, caseId }: { shopId: number; question: string; caseId?: number },
  compute: () => Promise<T>,
): Promise<{ value: T; hit: boolean }> {
  const version = await casebookVersion(getModels().sequelize, shopId, caseId);
  const key = `${shopId}\u0000${version}\u0000${question}`;
  const map = answers();
  const now = Date.now();
  const entry = map.get(key);
  if (entry && entry.untilMs > now) {
    // Most recently used last: a full map drops the answer used longest ago.
    map.delete(key);
    map.set(key, entry);
    return { value: entry.value as T, hit: true };
  }
  const value = await compute();
  if (map.size >= MAX_ANSWERS) {
    const oldest = map.keys().next().value;
    if (oldest !== undefined) map.delete(oldest);
  }
  map.set(key, { value, untilMs: now + ANSWER_TTL_MS });
  return { value, hit: false };
}
