import "server-only";
import { pageOf } from "./paging";
import { Op } from "sequelize";
import { getModels } from "@/models";
import { AppError } from "@/lib/errors";
import { recordAudit } from "./audit";
import type { User } from "lucia";
import { getProfile } from "./profile";
import { type MassUnit, type VolumeUnit } from "@/lib/units";
import {
  type SpecRow,
  type SpecCsvParse,
  matchSpecRows,
  parseSpecCsv,
  specMatchKey,
  specRowsToCsv,
} from "@/lib/specs";
import type {
  SpecEntryDto,
  SpecImportCommitResponse,
  SpecInput,
  SpecMatchDto,
  SpecMatchesResponse,
  SpecListResponse,
} from "@/lib/contracts/specs";

type SpecEntryRow = SpecRow & { id: number; updatedAt: Date };

function toDto(r: SpecEntryRow): SpecEntryDto {
  return {
    id: r.id,
    yearFrom: r.yearFrom,
    yearTo: r.yearTo,
    make: r.make,
    model: r.model,
    variant: r.variant,
    rearAc: Boolean(r.rearAc),
    refrigerant: r.refrigerant,
    labelChargeG: r.labelChargeG,
    oilType: r.oilType,
    totalOilMl: r.totalOilMl ?? null,
    compressorType: r.compressorType ?? null,
    updatedAt: new Date(r.updatedAt).toISOString(),
  };
}

const escapeLike = (t: string) => t.replace(/[%_\\]/g, (c) => `\\${c}`);

/** The shop's spec table, optionally narrowed by words that must each appear in make, model or variant (or be a covered year). */
export async function listSpecs({
  shopId,
  q,
  limit = 500,
  offset = 0,
}: {
  shopId: number;
  q?: string;
  limit?: number;
  offset?: number;
}): Promise<SpecEntryDto[]> {
  const { SpecEntry } = getModels();
  const words = (q ?? "").split(/\s+/).filter(Boolean).slice(0, 6);
  const and = words.map((w) => {
    const like = `%${escapeLike(w)}%`;
    const alternatives: object[] = [
      { make: { [Op.like]: like } },
      { model: { [Op.like]: like } },
      { variant: { [Op.like]: like } },
    ];
    if (/^\d{4}$/.test(w))
      alternatives.push({ yearFrom: { [Op.lte]: Number(w) }, yearTo: { [Op.gte]: Number(w) } });
    return { [Op.or]: alternatives };
  });
  const rows = await SpecEntry.findAll({
    where: { shopId, ...(and.length ? { [Op.and]: and } : {}) },
    order: [
      ["make", "ASC"],
      ["model", "ASC"],
      ["yearFrom", "ASC"],
      ["variant", "ASC"],
      ["rearAc", "ASC"],
      ["id", "ASC"],
    ],
    limit,
    offset,
    raw: true,
  });
  return (rows as unknown as SpecEntryRow[]).map(toDto);
}

/** One page of the spec table for GET /api/specs. */
export async function listSpecPage({
  shopId,
  q,
  limit,
  offset,
}: {
  shopId: number;
  q?: string;
  limit: number;
  offset: number;
}): Promise<SpecListResponse> {
  const page = pageOf(await listSpecs({ shopId, q, limit: limit + 1, offset }), { limit, offset });
  return { specs: page.items, nextOffset: page.nextOffset };
}

async function allRows(shopId: number): Promise<SpecEntryDto[]> {
  return listSpecs({ shopId, limit: 100_000 });
}

const MATCH_KEY_INDEX = "spec_entry_shop_match_key";

function isMatchKeyClash(error: unknown): boolean {
  const e = error as { name?: string; parent?: { message?: string }; message?: string } | null;
  return (
    e?.name === "SequelizeUniqueConstraintError" &&
    `${e.parent?.message ?? ""} ${e.message ?? ""}`.includes(MATCH_KEY_INDEX)
  );
}

function describeRow(r: SpecEntryDto): string {
  const years = r.yearFrom === r.yearTo ? `${r.yearFrom}` : `${r.yearFrom}–${r.yearTo}`;
  return `${r.make} ${r.model}${r.variant ? ` ${r.variant}` : ""}, ${years}, ${r.rearAc ? "front and rear A/C" : "front A/C only"}`;
}

/**
 * The unique index on (shop_id, match_key) decides, so two parallel writes of one vehicle written
 * two ways cannot both get in; the loser is told which row it repeats.
 */
async function duplicateError(shopId: number, input: SpecInput): Promise<AppError> {
  const { SpecEntry } = getModels();
  const clash = await SpecEntry.findOne({ where: { shopId, matchKey: specMatchKey(input) }, raw: true });
  const row = clash ? toDto(clash as unknown as SpecEntryRow) : null;
  const where = row ? `row ${row.id}: ${describeRow(row)}` : "another row";
  return new AppError(
    "conflict:spec",
    `The spec table already has this vehicle variant (${where}). Change that row instead, or tell the two apart by variant or years.`,
    {
      fieldErrors: { model: [row ? `Already in the table (row ${row.id}).` : "Already in the table."] },
      ...(row ? { details: { clash: row } } : {}),
    },
  );
}

/** Who made a change to the spec table, for its audit row: the signed-in user, or null for a script. */
type Actor = { actorId: string | null };

const audit = (shopId: number, actorId: string | null, entityId: number | string, action: string) => ({
  shopId,
  actorId,
  entity: "spec_entry",
  entityId,
  action,
});

export async function createSpec({
  shopId,
  actorId,
  input,
}: Actor & {
  shopId: number;
  input: SpecInput;
}): Promise<SpecEntryDto> {
  const { SpecEntry, sequelize } = getModels();
  try {
    return await sequelize.transaction(async (transaction) => {
      const row = await SpecEntry.create({ ...input, shopId }, { transaction });
      await recordAudit({ ...audit(shopId, actorId, row.id, "created"), transaction });
      return toDto(row.get({ plain: true }) as unknown as SpecEntryRow);
    });
  } catch (error) {
    if (isMatchKeyClash(error)) throw await duplicateError(shopId, input);
    throw error;
  }
}

export async function updateSpec({
  shopId,
  actorId,
  id,
  input,
}: Actor & {
  shopId: number;
  id: number;
  input: SpecInput;
}): Promise<SpecEntryDto> {
  const { SpecEntry, sequelize } = getModels();
  try {
    return await sequelize.transaction(async (transaction) => {
      const row = await SpecEntry.findOne({ where: { id, shopId }, transaction });
      if (!row) throw new AppError("not_found:spec", "No such spec row in this shop.");
      await row.update({ ...input, matchKey: specMatchKey(input) }, { transaction });
      await recordAudit({ ...audit(shopId, actorId, row.id, "updated"), transaction });
      return toDto(row.get({ plain: true }) as unknown as SpecEntryRow);
    });
  } catch (error) {
    if (isMatchKeyClash(error)) throw await duplicateError(shopId, input);
    throw error;
  }
}

export async function deleteSpec({
  shopId,
  actorId,
  id,
}: Actor & { shopId: number; id: number }): Promise<void> {
  const { SpecEntry, ServiceRecord, sequelize } = getModels();
  await sequelize.transaction(async (transaction) => {
    const row = await SpecEntry.findOne({ where: { id, shopId }, transaction });
    if (!row) throw new AppError("not_found:spec", "No such spec row in this shop.");
    const used = await ServiceRecord.count({ where: { shopId, specEntryId: id }, transaction });
    if (used > 0)
      throw new AppError(
        "conflict:spec",
        `${used} service record${used > 1 ? "s use" : " uses"} this row; correct it instead of deleting it.`,
      );
    await row.destroy({ transaction });
    await recordAudit({ ...audit(shopId, actorId, id, "deleted"), transaction });
  });
}

export type ImportUnits = { charge?: MassUnit; oil?: VolumeUnit };

/** Read the CSV against what the table holds now; nothing is saved. */
export async function previewSpecImport({
  shopId,
  csv,
  units,
}: {
  shopId: number;
  csv: string;
  units?: ImportUnits;
}): Promise<SpecCsvParse> {
  return parseSpecCsv(csv, { units, existing: await allRows(shopId) });
}

/** Save the rows without problems, all or none, after reading the file again against the table as it is now. */
export async function commitSpecImport({
  shopId,
  actorId,
  csv,
  units,
}: Actor & {
  shopId: number;
  csv: string;
  units?: ImportUnits;
}): Promise<SpecImportCommitResponse> {
  const { SpecEntry, sequelize } = getModels();
  return sequelize.transaction(async (transaction) => {
    const parsed = parseSpecCsv(csv, { units, existing: await allRows(shopId) });
    if (parsed.fileProblems.length > 0) {
      throw new AppError("bad_request:import", parsed.fileProblems.join(" "), {
        fieldErrors: { csv: parsed.fileProblems },
      });
    }
    const good = parsed.rows.filter((r) => r.values && r.problems.length === 0);
    if (good.length === 0)
      throw new AppError(
        "bad_request:import",
        "No row in the file can be saved; fix the problems shown and try again.",
      );
    try {
      await SpecEntry.bulkCreate(
        good.map((r) => ({ ...(r.values as SpecRow), shopId })),
        { transaction },
      );
    } catch (error) {
      // A row saved by someone else between this file's check and its insert: all or none.
      if (isMatchKeyClash(error))
        throw new AppError(
          "conflict:spec",
          "Someone added one of these vehicles to the spec table meanwhile; nothing was saved. Preview the file again.",
        );
      throw error;
    }
    const result = { created: good.length, leftOut: parsed.rows.length - good.length };
    await recordAudit({ ...audit(shopId, actorId, "import", "imported"), detail: result, transaction });
    return result;
  });
}

export async function exportSpecsCsv({
  shopId,
  units,
  reader,
}: {
  shopId: number;
  units?: ImportUnits;
  /** whose units fill in any unit the request leaves out; grams and millilitres when nobody is named */
  reader?: Pick<User, "id" | "shopId">;
}): Promise<string> {
  const own = reader ? (await getProfile({ user: reader })).units : null;
  return specRowsToCsv(await allRows(shopId), {
    units: { charge: units?.charge ?? own?.mass, oil: units?.oil ?? own?.volume },
  });
}

export interface SpecVehicle {
  year: number;
  make: string;
  model: string;
  engine?: string | null;
  rearAc?: boolean | null;
}

/** Spec rows that could apply to the vehicle, best first, for the technician to confirm one. */
export async function listSpecMatches({
  shopId,
  vehicle,
}: {
  shopId: number;
  vehicle: SpecVehicle;
}): Promise<SpecMatchDto[]> {
  // Spellings differ ("Mercedes-Benz", "mercedes benz"): matchSpecRows compares normalised names.
  return matchSpecRows(vehicle, await allRows(shopId));
}

export async function listSpecMatchesForVehicle({
  shopId,
  vehicleId,
}: {
  shopId: number;
  vehicleId: number;
}): Promise<SpecMatchesResponse> {
  const vehicle = await getModels().Vehicle.findOne({ where: { id: vehicleId, shopId }, raw: true });
  if (!vehicle) throw new AppError("not_found:vehicle", "No such vehicle in this shop.");
  const matches = await listSpecMatches({
    shopId,
    vehicle: { year: vehicle.year, make: vehicle.make, model: vehicle.model, engine: vehicle.engine },
  });
  return {
    vehicle: {
      id: vehicle.id,
      year: vehicle.year,
      make: vehicle.make,
      model: vehicle.model,
      engine: vehicle.engine,
    },
    matches,
  };
}

export async function getSpec({ shopId, id }: { shopId: number; id: number }): Promise<SpecEntryDto | null> {
  const row = await getModels().SpecEntry.findOne({ where: { id, shopId }, raw: true });
  return row ? toDto(row as unknown as SpecEntryRow) : null;
}
