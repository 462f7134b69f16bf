import "server-only";
import { Op, QueryTypes, type Transaction } from "sequelize";
import { getModels, type CylinderKind } from "@/models";
import { AppError } from "@/lib/errors";
import { sayInUnits } from "@/lib/units/quantity";
import { recordAudit } from "./audit";
import type { User } from "lucia";
import { getProfile } from "./profile";
import { getShop } from "./shops";
import type { RefrigerantId } from "@/lib/refrigerants";
import {
  type Cylinder as LedgerCylinder,
  type CylinderMovement,
  type CylinderState,
  type MovementType,
  applyMovements,
} from "@/lib/service/ledger";
import { ledgerMassUnit, safeFillG } from "@/lib/service/ledger-guard";
import { monthlyReport, toCsv } from "@/lib/service/ledger-report";
import { latestMonths } from "@/lib/service/report-months";
import { derivedFrom, rememberedLedger, type RememberedLedger } from "./ledger-memory";
import {
  CYLINDER_PAGE_DEFAULT,
  type CreateCylinderInput,
  type CylinderDto,
  type CylinderListQuery,
  type CylinderListResponse,
} from "@/lib/contracts/cylinders";
import {
  MOVEMENT_PAGE_DEFAULT,
  type LedgerReportResponse,
  type MovementDto,
  type MovementListQuery,
  type MovementListResponse,
} from "@/lib/contracts/ledger";

export type CylinderRow = {
  id: number;
  label: string;
  serial: string | null;
  refrigerant: RefrigerantId;
  kind: CylinderKind;
  tareG: number;
  capacityG: number;
  initialNetG: number;
  retiredAt: Date | null;
};
export type MovementRow = {
  id: number;
  cylinderId: number;
  caseId: number | null;
  serviceRecordId: number | null;
  technicianId: string;
  type: MovementType;
  refrigerant: RefrigerantId;
  massG: number;
  occurredAt: Date;
  reversesId: number | null;
  destination: string | null;
  note: string | null;
};

export function toLedgerCylinder(c: CylinderRow): LedgerCylinder {
  return {
    id: String(c.id),
    refrigerant: c.refrigerant,
    kind: c.kind === "recovery" ? "recovery" : "supply",
    capacityG: c.capacityG,
    tareG: c.tareG,
    initialNetG: c.initialNetG,
  };
}

export function toLedgerMovement(m: MovementRow): CylinderMovement {
  return {
    id: String(m.id),
    cylinderId: String(m.cylinderId),
    type: m.type,
    massG: m.massG,
    at: new Date(m.occurredAt).toISOString(),
    technicianId: m.technicianId,
    refrigerant: m.refrigerant,
    ...(m.serviceRecordId ? { serviceRecordId: String(m.serviceRecordId) } : {}),
    ...(m.reversesId ? { reverses: String(m.reversesId) } : {}),
    ...(m.destination ? { destination: m.destination } : {}),
  };
}

/** Every line of the shop, oldest first: the monthly report needs them all. */
async function movementRows(shopId: number, transaction?: Transaction): Promise<MovementRow[]> {
  const rows = await getModels().RefrigerantMovement.findAll({
    where: { shopId },
    order: [
      ["occurredAt", "ASC"],
      ["id", "ASC"],
    ],
    raw: true,
    transaction,
  });
  return rows as unknown as MovementRow[];
}

/** Every line of the shop as the ledger's rules read them, kept while the shop adds none (./ledger-memory.ts). */
function shopLedger(shopId: number) {
  return rememberedLedger(shopId, async () => (await movementRows(shopId)).map(toLedgerMovement));
}

/** The lines of the given cylinders only, oldest first. */
export async function cylinderMovementRows({
  shopId,
  cylinderIds,
  transaction,
  latest = false,
}: {
  shopId: number;
  cylinderIds: number[];
  transaction?: Transaction;
  /**
   * Read what is committed now (a locking read), not the transaction's snapshot: a post that
   * waited for a cylinder's lock must see the lines the post before it added.
   */
  latest?: boolean;
}): Promise<MovementRow[]> {
  if (cylinderIds.length === 0) return [];
  const rows = await getModels().RefrigerantMovement.findAll({
    where: { shopId, cylinderId: cylinderIds },
    order: [
      ["occurredAt", "ASC"],
      ["id", "ASC"],
    ],
    raw: true,
    transaction,
    ...(latest && transaction ? { lock: transaction.LOCK.SHARE } : {}),
  });
  return rows as unknown as MovementRow[];
}

function toCylinderDto(
  c: CylinderRow,
  movements: readonly CylinderMovement[],
  say: (text: string) => string,
  // The replay, when it was worked out before (./ledger-memory.ts keeps it per state of the lines).
  state: CylinderState = applyMovements(toLedgerCylinder(c), movements),
): CylinderDto {
  // A correction always cancels a movement of the same cylinder, so `movements` holds both ends of it.
  const ledgerCylinder = toLedgerCylinder(c);
  return {
    id: c.id,
    label: c.label,
    serial: c.serial,
    refrigerant: c.refrigerant,
    kind: c.kind,
    tareG: c.tareG,
    capacityG: c.capacityG,
    initialNetG: c.initialNetG,
    retired: Boolean(c.retiredAt),
    netG: state.netG,
    grossG: state.grossG,
    fillPct: state.fill.fillPct,
    limitPct: state.fill.limitPct,
    safeFillG: safeFillG(ledgerCylinder),
    roomG: state.fill.roomG,
    fillMessage: say(state.fill.message),
    problems: state.problems.map(say),
  };
}

/**
 * Cylinders ordered by label with their contents replayed from their own lines. `ids` picks
 * some; `limit` and `after` (the last label of the previous page) page through the rest.
 */
export async function listCylinders({
  shopId,
  includeRetired = true,
  ids,
  limit,
  after,
  transaction,
  say = (text) => sayInUnits(text),
  ledger: kept,
}: {
  shopId: number;
  includeRetired?: boolean;
  ids?: number[];
  limit?: number;
  after?: string;
  transaction?: Transaction;
  /** How the fill sentence and problems are said: in SI for an API answer (the default). */
  say?: (text: string) => string;
  /** The shop's kept lines when the caller has already asked for them (one page reading them twice). */
  ledger?: Promise<RememberedLedger>;
}): Promise<CylinderDto[]> {
  if (ids && ids.length === 0) return [];
  const rows = (await getModels().Cylinder.findAll({
    where: {
      shopId,
      ...(ids ? { id: ids } : {}),
      ...(includeRetired ? {} : { retiredAt: null }),
      ...(after !== undefined ? { label: { [Op.gt]: after } } : {}),
    },
    order: [["label", "ASC"]],
    ...(limit ? { limit } : {}),
    raw: true,
    transaction,
  })) as unknown as CylinderRow[];
  if (transaction) {
    // Inside a transaction: its own snapshot of these cylinders' lines, never the kept ones.
    const movements = (
      await cylinderMovementRows({ shopId, cylinderIds: rows.map((c) => c.id), transaction })
    ).map(toLedgerMovement);
    return rows.map((c) =>
      toCylinderDto(
        c,
        movements.filter((m) => m.cylinderId === String(c.id)),
        say,
      ),
    );
  }
  const ledger = await (kept ?? shopLedger(shopId));
  // A cylinder's contents are replayed once per state of the shop's lines and of the cylinder's own row;
  // only the saying is done per request.
  return rows.map((c) => {
    const movements = ledger.byCylinder.get(String(c.id)) ?? [];
    const state = derivedFrom(ledger, `cylinder:${JSON.stringify(c)}`, () =>
      applyMovements(toLedgerCylinder(c), movements),
    );
    return toCylinderDto(c, movements, say, state);
  });
}

/** GET /api/cylinders: one page, and the cursor of the next one. */
export async function listCylinderPage({
  shopId,
  query,
  ledger,
}: {
  shopId: number;
  query: CylinderListQuery;
  ledger?: Promise<RememberedLedger>;
}): Promise<CylinderListResponse> {
  const limit = query.limit ?? CYLINDER_PAGE_DEFAULT;
  const page = await listCylinders({
    shopId,
    includeRetired: query.retired !== "exclude",
    limit: limit + 1,
    after: query.after,
    ledger,
  });
  const more = page.length > limit;
  const cylinders = more ? page.slice(0, limit) : page;
  return { cylinders, nextCursor: more ? (cylinders.at(-1)?.label ?? null) : null };
}

async function oneCylinder(shopId: number, id: number, transaction?: Transaction): Promise<CylinderDto> {
  const [found] = await listCylinders({ shopId, ids: [id], transaction });
  if (!found) throw new AppError("not_found:cylinder", "No such cylinder in this shop.");
  return found;
}

export async function createCylinder({
  shopId,
  actorId,
  input,
}: {
  shopId: number;
  actorId: string;
  input: CreateCylinderInput;
}): Promise<CylinderDto> {
  const { Cylinder, sequelize } = getModels();
  return sequelize.transaction(async (transaction) => {
    if (await Cylinder.findOne({ where: { shopId, label: input.label }, attributes: ["id"], transaction })) {
      throw new AppError("conflict:cylinder", "Another cylinder already has this label.", {
        fieldErrors: { label: ["Another cylinder already has this label."] },
      });
    }
    const row = await Cylinder.create({ ...input, serial: input.serial ?? null, shopId }, { transaction });
    await recordAudit({
      shopId,
      actorId,
      entity: "cylinder",
      entityId: row.id,
      action: "created",
      transaction,
    });
    return oneCylinder(shopId, row.id, transaction);
  });
}

export async function setCylinderRetired({
  shopId,
  actorId,
  id,
  retired,
}: {
  shopId: number;
  actorId: string;
  id: number;
  retired: boolean;
}): Promise<CylinderDto> {
  const { Cylinder, sequelize } = getModels();
  return sequelize.transaction(async (transaction) => {
    const row = await Cylinder.findOne({ where: { id, shopId }, transaction });
    if (!row) throw new AppError("not_found:cylinder", "No such cylinder in this shop.");
    await row.update({ retiredAt: retired ? (row.retiredAt ?? new Date()) : null }, { transaction });
    await recordAudit({
      shopId,
      actorId,
      entity: "cylinder",
      entityId: row.id,
      action: retired ? "retired" : "reactivated",
      transaction,
    });
    return oneCylinder(shopId, id, transaction);
  });
}

type MovementWithNames = MovementRow & { Cylinder: { label: string }; technician: { name: string } };

function movementIncludes() {
  const { Cylinder, User } = getModels();
  return [
    { model: Cylinder, attributes: ["label"] },
    { model: User, as: "technician", attributes: ["name"] },
  ];
}

/** The ids of the corrections cancelling any of `ids` (one query, only for the lines asked about). */
async function reversalsOf(
  shopId: number,
  ids: number[],
  transaction?: Transaction,
): Promise<Map<number, number>> {
  const reversedBy = new Map<number, number>();
  if (ids.length === 0) return reversedBy;
  const rows = await getModels().RefrigerantMovement.findAll({
    where: { shopId, reversesId: ids },
    attributes: ["id", "reversesId"],
    raw: true,
    transaction,
  });
  for (const r of rows) if (r.reversesId) reversedBy.set(r.reversesId, r.id);
  return reversedBy;
}

function toMovementDto(m: MovementWithNames, reversedBy: Map<number, number>): MovementDto {
  return {
    id: m.id,
    cylinderId: m.cylinderId,
    cylinderLabel: m.Cylinder.label,
    caseId: m.caseId,
    serviceRecordId: m.serviceRecordId,
    technicianId: m.technicianId,
    technician: m.technician.name,
    type: m.type,
    refrigerant: m.refrigerant,
    massG: m.massG,
    occurredAt: new Date(m.occurredAt).toISOString(),
    reversesId: m.reversesId,
    reversedById: reversedBy.get(m.id) ?? null,
    destination: m.destination,
    note: m.note,
  };
}

/** The newest lines first; `before` (a nextCursor) continues after the last line of a page. */
export async function listMovements({
  shopId,
  cylinderId,
  limit = MOVEMENT_PAGE_DEFAULT,
  before,
}: {
  shopId: number;
  cylinderId?: number;
  limit?: number;
  before?: string;
}): Promise<MovementDto[]> {
  const [beforeAt, beforeId] = before ? before.split("~") : [];
  const after = Boolean(beforeAt && beforeId);
  // One read of rows (index refrigerant_movement_shop_occurred), with the cylinder's label, the
  // technician's name and the correction cancelling each line (the unique index on reverses_id).
  const rows = await getModels().sequelize.query<
    Omit<
      MovementRow,
      "cylinderId" | "caseId" | "serviceRecordId" | "technicianId" | "massG" | "occurredAt" | "reversesId"
    > & {
      cylinder_id: number;
      case_id: number | null;
      service_record_id: number | null;
      technician_id: string;
      mass_g: number;
      occurred_at: Date;
      reverses_id: number | null;
      cylinder_label: string;
      technician: string;
      reversed_by_id: number | null;
    }
  >(
    `SELECT m.id, m.cylinder_id, m.case_id, m.service_record_id, m.technician_id, m.type, m.refrigerant,
            m.mass_g, m.occurred_at, m.reverses_id, m.destination, m.note,
            y.label AS cylinder_label, u.name AS technician,
            (SELECT r.id FROM refrigerant_movement r WHERE r.reverses_id = m.id AND r.shop_id = m.shop_id)
              AS reversed_by_id
       FROM refrigerant_movement m
       JOIN cylinder y ON y.id = m.cylinder_id
       JOIN user u ON u.id = m.technician_id
      WHERE m.shop_id = :shopId${cylinderId ? " AND m.cylinder_id = :cylinderId" : ""}${
        after ? " AND (m.occurred_at < :beforeAt OR (m.occurred_at = :beforeAt AND m.id < :beforeId))" : ""
      }
      ORDER BY m.occurred_at DESC, m.id DESC
      LIMIT :limit`,
    {
      replacements: {
        shopId,
        cylinderId: cylinderId ?? null,
        beforeAt: after ? new Date(beforeAt!) : null,
        beforeId: after ? Number(beforeId) : null,
        limit,
      },
      type: QueryTypes.SELECT,
    },
  );
  return rows.map((m) => ({
    id: m.id,
    cylinderId: m.cylinder_id,
    cylinderLabel: m.cylinder_label,
    caseId: m.case_id,
    serviceRecordId: m.service_record_id,
    technicianId: m.technician_id,
    technician: m.technician,
    type: m.type,
    refrigerant: m.refrigerant,
    massG: m.mass_g,
    occurredAt: new Date(m.occurred_at).toISOString(),
    reversesId: m.reverses_id,
    reversedById: m.reversed_by_id ?? null,
    destination: m.destination,
    note: m.note,
  }));
}

/** GET /api/ledger/movements: one page, and the cursor of the next one. */
export async function listMovementPage({
  shopId,
  query,
}: {
  shopId: number;
  query: MovementListQuery;
}): Promise<MovementListResponse> {
  const limit = query.limit ?? MOVEMENT_PAGE_DEFAULT;
  const page = await listMovements({
    shopId,
    cylinderId: query.cylinderId,
    before: query.before,
    limit: limit + 1,
  });
  const more = page.length > limit;
  const movements = more ? page.slice(0, limit) : page;
  const last = movements.at(-1);
  return { movements, nextCursor: more && last ? `${last.occurredAt}~${last.id}` : null };
}

/** One ledger line by id, however old; not_found when it is missing or another shop's. */
export async function getMovement({
  shopId,
  id,
  transaction,
}: {
  shopId: number;
  id: number;
  transaction?: Transaction;
}): Promise<MovementDto> {
  const row = await getModels().RefrigerantMovement.findOne({
    where: { shopId, id },
    include: movementIncludes(),
    transaction,
  });
  if (!row) throw new AppError("not_found:movement", "No such ledger line in this shop.");
  const m = row.get({ plain: true }) as unknown as MovementWithNames;
  return toMovementDto(m, await reversalsOf(shopId, [m.id], transaction));
}

/** The shop's time zone, its people's names and the monthly report (worked out once per state of the lines). */
async function reportParts(shopId: number, kept?: Promise<RememberedLedger>) {
  const { User } = getModels();
  const [shop, users, ledger] = await Promise.all([
    // The page's shell reads the shop too: once per render (./shops.ts).
    getShop({ shopId }),
    User.findAll({ where: { shopId }, attributes: ["id", "name"], raw: true }),
    kept ?? shopLedger(shopId),
  ]);
  const timeZone = shop.timeZone;
  const names: Record<string, string> = Object.fromEntries(users.map((u) => [u.id, u.name]));
  const report = derivedFrom(ledger, `report:${timeZone}`, () =>
    monthlyReport(ledger.movements, { timeZone }),
  );
  return { timeZone, names, report };
}

/**
 * Recovered, recycled, charged and sent out per month × technician × refrigerant, in the shop's time zone;
 * `months`: the latest this many months only (the page's first view), with the count of all of them.
 */
export async function ledgerReportRows({
  shopId,
  months,
  ledger,
}: {
  shopId: number;
  months?: number;
  ledger?: Promise<RememberedLedger>;
}): Promise<LedgerReportResponse> {
  const { timeZone, names, report } = await reportParts(shopId, ledger);
  const latest = latestMonths(report, months ?? Number.POSITIVE_INFINITY);
  return {
    rows: latest.rows.map((r) => ({ ...r, technician: names[r.technicianId] ?? r.technicianId })),
    timeZone,
    monthCount: latest.monthCount,
  };
}

/** The monthly report and its CSV, in the reader's mass unit. */
export async function ledgerReport({
  shopId,
  reader,
}: {
  shopId: number;
  /** whose units the CSV is written in; grams when nobody is named */
  reader?: Pick<User, "id" | "shopId">;
}): Promise<LedgerReportResponse & { csv: string }> {
  const { timeZone, names, report } = await reportParts(shopId);
  return {
    rows: report.map((r) => ({ ...r, technician: names[r.technicianId] ?? r.technicianId })),
    monthCount: new Set(report.map((r) => r.month)).size,
    csv: toCsv(report, {
      technicianNames: names,
      massUnit: reader ? ledgerMassUnit((await getProfile({ user: reader })).units.mass) : "g",
    }),
    timeZone,
  };
}

/**
 * GET /api/ledger/report: the CSV (every month, in the reader's mass unit), or the JSON rows, every month
 * or the latest `months` only; the JSON answer writes no CSV.
 */
export async function ledgerReportAnswer({
  shopId,
  reader,
  format,
  months,
}: {
  shopId: number;
  reader: Pick<User, "id" | "shopId">;
  format?: "json" | "csv";
  months?: number;
}): Promise<{ csv: string } | { json: LedgerReportResponse }> {
  if (format === "csv") return { csv: (await ledgerReport({ shopId, reader })).csv };
  return { json: await ledgerReportRows({ shopId, months }) };
}

/**
 * What the ledger page shows from the shop's kept lines, the first page of cylinders and the report's
 * latest `months`, with one check of those lines against the database for both.
 */
export async function ledgerPageParts({ shopId, months }: { shopId: number; months: number }) {
  const ledger = shopLedger(shopId);
  // Both wait on the one read; a failure is reported by whichever awaits it first.
  ledger.catch(() => undefined);
  const [cylinders, report] = await Promise.all([
    listCylinderPage({ shopId, query: {}, ledger }),
    ledgerReportRows({ shopId, months, ledger }),
  ]);
  return { cylinders, report };
}
