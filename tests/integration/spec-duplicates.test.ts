import { afterAll, describe, expect, it } from "vitest";
import { closeSequelize } from "@/lib/db/sequelize";
import { isAppError, type AppError } from "@/lib/errors";
import { createSpec, listSpecs, updateSpec } from "@/lib/server/specs";
import type { SpecEntryDto, SpecInput } from "@/lib/contracts/specs";
import { getModels } from "@/models";
import { uniqueName } from "./helpers";

afterAll(() => closeSequelize());

// An invented pickup; the charge is not anyone's specification.
const PICKUP: SpecInput = {
  yearFrom: 2015,
  yearTo: 2020,
  make: "Ford",
  model: "F-150",
  variant: "",
  rearAc: false,
  refrigerant: "R-1234yf",
  labelChargeG: 680,
  oilType: "PAG 46",
  totalOilMl: 200,
};
// One model written five ways: case, spaces, punctuation.
const SPELLINGS = ["F-150", "f150", "F 150", "F.150 ", "f—150"];

async function newShop(): Promise<number> {
  return (await getModels().Shop.create({ name: uniqueName("Spec shop") })).id;
}

type Settled<T> = { ok: true; value: T } | { ok: false; error: AppError };
async function settle<T>(promise: Promise<T>): Promise<Settled<T>> {
  try {
    return { ok: true, value: await promise };
  } catch (error) {
    if (!isAppError(error)) throw error;
    return { ok: false, error };
  }
}

describe("spec rows: one vehicle variant, one row, even under parallel writes", () => {
  it("lets exactly one of five parallel rows with the model written five ways in; the others get 409 naming it", async () => {
    const shopId = await newShop();
    const results = await Promise.all(
      SPELLINGS.map((model) => settle(createSpec({ shopId, actorId: null, input: { ...PICKUP, model } }))),
    );
    const created = results.filter((r): r is { ok: true; value: SpecEntryDto } => r.ok);
    const refused = results.filter((r): r is { ok: false; error: AppError } => !r.ok);
    console.log(
      `5 parallel spellings of one model: ${created.length} row(s) stored, ${refused.length} refused`,
    );
    expect(created).toHaveLength(1);
    expect(refused).toHaveLength(4);
    const winner = created[0]!.value;
    for (const { error } of refused) {
      expect(error.status).toBe(409);
      expect(error.code).toBe("conflict:spec");
      expect(error.message).toContain(`row ${winner.id}: Ford ${winner.model}, 2015–2020, front A/C only`);
      expect(error.fieldErrors?.model).toEqual([`Already in the table (row ${winner.id}).`]);
      expect((error.details?.clash as SpecEntryDto).id).toBe(winner.id);
    }
    expect(await listSpecs({ shopId })).toHaveLength(1);
  });

  it("refuses the same spellings one at a time too, and keeps other variants, years and shops apart", async () => {
    const shopId = await newShop();
    await createSpec({ shopId, actorId: null, input: PICKUP });
    for (const model of SPELLINGS.slice(1))
      await expect(createSpec({ shopId, actorId: null, input: { ...PICKUP, model } })).rejects.toMatchObject({
        status: 409,
      });
    await createSpec({ shopId, actorId: null, input: { ...PICKUP, variant: "3.5L EcoBoost" } });
    await createSpec({ shopId, actorId: null, input: { ...PICKUP, yearFrom: 2021, yearTo: 2023 } });
    await createSpec({ shopId, actorId: null, input: { ...PICKUP, rearAc: true } });
    await createSpec({ shopId: await newShop(), actorId: null, input: PICKUP });
    expect(await listSpecs({ shopId })).toHaveLength(4);
  });

  it("lets only one of two parallel edits turn two rows into the same vehicle", async () => {
    const shopId = await newShop();
    const a = await createSpec({ shopId, actorId: null, input: { ...PICKUP, variant: "2.7L" } });
    const b = await createSpec({ shopId, actorId: null, input: { ...PICKUP, variant: "3.3L" } });
    const c = await createSpec({ shopId, actorId: null, input: { ...PICKUP, variant: "5.0L" } });
    const target = { ...PICKUP, variant: "3.5L" };
    const results = await Promise.all(
      [a, b, c].map((row, i) =>
        settle(updateSpec({ shopId, actorId: null, id: row.id, input: { ...target, model: SPELLINGS[i]! } })),
      ),
    );
    expect(results.filter((r) => r.ok)).toHaveLength(1);
    expect(results.filter((r) => !r.ok).map((r) => (r.ok ? 0 : r.error.status))).toEqual([409, 409]);
    const variants = (await listSpecs({ shopId })).map((r) => r.variant).sort();
    expect(variants.filter((v) => v === "3.5L")).toHaveLength(1);
    expect(variants).toHaveLength(3);
  });

  it("keeps the stored key in step with an edited row", async () => {
    const shopId = await newShop();
    const row = await createSpec({ shopId, actorId: null, input: PICKUP });
    await updateSpec({ shopId, actorId: null, id: row.id, input: { ...PICKUP, model: "F-250" } });
    const stored = await getModels().SpecEntry.findByPk(row.id, { raw: true });
    expect(stored?.matchKey).toBe("ford|f250||2015|2020|front");
    // The old spelling is free again; the new one is taken.
    await createSpec({ shopId, actorId: null, input: { ...PICKUP, model: "f150" } });
    await expect(
      createSpec({ shopId, actorId: null, input: { ...PICKUP, model: "F 250" } }),
    ).rejects.toMatchObject({
      status: 409,
    });
  });
});
