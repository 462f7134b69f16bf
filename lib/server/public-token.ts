import "server-only";
import { shareTokenSchema } from "@/lib/contracts/owner-summary";
import { AppError } from "@/lib/errors";
import { LINK_NO_LONGER_VALID } from "./share-links";

/** A token from a public route's params; anything not shaped like ours is simply not a valid link. */
export function tokenFromParams(params: Record<string, unknown>): string {
  const parsed = shareTokenSchema.safeParse(params.token);
  if (!parsed.success) throw new AppError("not_found:link", LINK_NO_LONGER_VALID);
  return parsed.data;
}
