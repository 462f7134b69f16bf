import { config, globalConfig } from "zod/v4/core";
import en from "zod/v4/locales/en.js";

/**
 * Zod's full build sets its English messages the first time it builds a schema; the mini build sets
 * none, so an issue without a message of ours would read only "Invalid input". Schemas built with
 * the mini build call this first: the same English default as the full build, set only when no
 * language has been chosen yet, so the server (which loads both builds) is unchanged.
 */
export function ensureEnglishMessages(): void {
  if (!globalConfig.localeError) config(en());
}
