import "server-only";

/** Ask the database for limit + 1 rows; this keeps limit of them and says whether another page follows. */
export function pageOf<T>(rows: T[], { limit, offset }: { limit: number; offset: number }) {
  return { items: rows.slice(0, limit), nextOffset: rows.length > limit ? offset + limit : null };
}
