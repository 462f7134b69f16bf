import "server-only";
import { QueryTypes } from "sequelize";
import { getModels } from "@/models";
import type { CylinderMovement } from "@/lib/service/ledger";

/**
 * A shop's ledger lines, read once and kept in this process while they stay the same.
 *
 * The ledger is append-only (models/refrigerant-movement.ts refuses updates and deletes; a mistake is
 * cancelled by a new line), so the set of a shop's lines only ever grows: its count and its highest id
 * name it. Each use asks the database for those two numbers (a count over the shop's entries of the
 * index refrigerant_movement_shop_id_id, no row read) and reads the lines again only when they differ
 * from what is kept.
 * A line committed by another request or another app instance changes the count, so nothing stale is
 * served, whichever instance answers. Reads inside a transaction (posting, saving a service record) do
 * not come here: they read their own snapshot, with locks where they need them.
 *
 * What is worked out from the lines (cylinder contents, the monthly report) is kept beside them and
 * dropped with them. A database restored from a backup under a running app can repeat a count and an
 * id with other lines: restart the app servers after a restore.
 */
export interface RememberedLedger {
  count: number;
  lastId: number;
  /** Every line of the shop, oldest first (occurred_at, then id). */
  movements: readonly CylinderMovement[];
  /** The same lines per cylinder id, oldest first. */
  byCylinder: ReadonlyMap<string, readonly CylinderMovement[]>;
  /** Results worked out from these lines, by a key their maker chooses. */
  derived: Map<string, unknown>;
}

/** Shops kept at once; the one kept longest is dropped first when a new one arrives. */
const MAX_SHOPS = 200;

const store = globalThis as typeof globalThis & { chillwrightLedgerMemory?: Map<number, RememberedLedger> };

function memory(): Map<number, RememberedLedger> {
  store.chillwrightLedgerMemory ??= new Map();
  return store.chillwrightLedgerMemory;
}

/** Forget every shop (tests). */
export function forgetLedgers(): void {
  memory().clear();
}

/**
 * The shop's lines as they are now in the database. `load` reads them all, oldest first, when what is
 * kept is missing or out of date.
 */
export async function rememberedLedger(
  shopId: number,
  load: () => Promise<CylinderMovement[]>,
): Promise<RememberedLedger> {
  const [now] = await getModels().sequelize.query<{ n: number | string; last: number | string | null }>(
    "SELECT COUNT(*) AS n, MAX(id) AS last FROM refrigerant_movement WHERE shop_id = ?",
    { replacements: [shopId], type: QueryTypes.SELECT },
  );
  const count = Number(now?.n ?? 0);
  const lastId = Number(now?.last ?? 0);
  const kept = memory().get(shopId);
  if (kept && kept.count === count && kept.lastId === lastId) return kept;

  const movements = await load();
  const byCylinder = new Map<string, CylinderMovement[]>();
  let highest = 0;
  for (const m of movements) {
    const list = byCylinder.get(m.cylinderId);
    if (list) list.push(m);
    else byCylinder.set(m.cylinderId, [m]);
    highest = Math.max(highest, Number(m.id));
  }
  // Named by what was read, not by the numbers asked first: a line committed in between makes them
  // differ, and the next use reads again.
  const fresh: RememberedLedger = {
    count: movements.length,
    lastId: highest,
    movements,
    byCylinder,
    derived: new Map(),
  };
  const map = memory();
  map.delete(shopId);
  if (map.size >= MAX_SHOPS) {
    const oldest = map.keys().next().value;
    if (oldest !== undefined) map.delete(oldest);
  }
  map.set(shopId, fresh);
  return fresh;
}

/** A result worked out once from these lines and kept with them. */
export function derivedFrom<T>(ledger: RememberedLedger, key: string, make: () => T): T {
  if (ledger.derived.has(key)) return ledger.derived.get(key) as T;
  const value = make();
  ledger.derived.set(key, value);
  return value;
}
