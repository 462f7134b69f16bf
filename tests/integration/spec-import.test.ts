import { afterAll, describe, expect, it } from "vitest";
import { closeSequelize } from "@/lib/db/sequelize";
import { getModels } from "@/models";
import {
  commitSpecImport,
  createSpec,
  deleteSpec,
  exportSpecsCsv,
  listSpecMatchesForVehicle,
  listSpecs,
  previewSpecImport,
  updateSpec,
} from "@/lib/server/specs";
import { createShopWithCase } from "./fixtures";
import "./helpers";

afterAll(() => closeSequelize());

// Invented rows for the test only; the charges are not anyone's specification.
const CSV = [
  "year_from,year_to,make,model,variant,rear_ac,refrigerant,label_charge_g,oil_type,total_oil_ml",
  "2014,2018,Mazda,3,2.0L,no,R-134a,520,PAG 46,120",
  "2014,2018,Mazda,3,2.0L,no,R-134a,530,PAG 46,120",
  "2016,2020,Toyota,Sienna,3.5L,yes,R-134a,1100,ND-OIL 8,180",
  "2016,2020,Toyota,Sienna,3.5L,no,R-134a,750,ND-OIL 8,150",
  "2019,2017,Honda,Civic,,no,R-1234yf,450,PAG 46,110",
  "2019,2022,Honda,Civic,,no,R-22,450,PAG 46,110",
  "2019,2022,Honda,Accord,,no,R-1234yf,12,PAG 46,110",
].join("\n");

describe("spec table CSV import", () => {
  it("previews each row's problems, saves only the good rows, and flags a second import as duplicates", async () => {
    const { shop } = await createShopWithCase(getModels());
    const preview = await previewSpecImport({ shopId: shop.id, csv: CSV });
    expect(preview.fileProblems).toEqual([]);
    const byLine = new Map(preview.rows.map((r) => [r.line, r]));
    expect(byLine.get(2)?.problems).toEqual([]);
    expect(byLine.get(3)?.problems.join(" ")).toMatch(/duplicate of line 2/);
    expect(byLine.get(4)?.problems).toEqual([]);
    expect(byLine.get(5)?.problems).toEqual([]);
    expect(byLine.get(6)?.problems.join(" ")).toMatch(/first year is after the last \(2019 to 2017\)/);
    expect(byLine.get(7)?.problems.join(" ")).toMatch(/unknown refrigerant/);
    expect(byLine.get(8)?.problems.join(" ")).toMatch(/label charge/);
    expect(await listSpecs({ shopId: shop.id })).toEqual([]); // a preview saves nothing

    const result = await commitSpecImport({ shopId: shop.id, actorId: null, csv: CSV });
    expect(result).toEqual({ created: 3, leftOut: 4 });
    const saved = await listSpecs({ shopId: shop.id });
    expect(saved.map((s) => `${s.model}:${s.rearAc}:${s.labelChargeG}`).sort()).toEqual([
      "3:false:520",
      "Sienna:false:750",
      "Sienna:true:1100",
    ]);

    const again = await previewSpecImport({ shopId: shop.id, csv: CSV });
    expect(again.rows.find((r) => r.line === 2)?.problems).toContain("already in the spec table");
    await expect(commitSpecImport({ shopId: shop.id, actorId: null, csv: CSV })).rejects.toMatchObject({
      status: 400,
    });
    expect(await listSpecs({ shopId: shop.id })).toHaveLength(3);
  });

  it("round-trips through the export", async () => {
    const { shop } = await createShopWithCase(getModels());
    await commitSpecImport({ shopId: shop.id, actorId: null, csv: CSV });
    const exported = await exportSpecsCsv({ shopId: shop.id });
    const other = await createShopWithCase(getModels());
    expect(await commitSpecImport({ shopId: other.shop.id, actorId: null, csv: exported })).toEqual({
      created: 3,
      leftOut: 0,
    });
    const strip = (rows: Awaited<ReturnType<typeof listSpecs>>) =>
      rows.map((r) => ({ ...r, id: 0, updatedAt: "" }));
    expect(strip(await listSpecs({ shopId: other.shop.id }))).toEqual(
      strip(await listSpecs({ shopId: shop.id })),
    );
  });

  it("refuses a file without the required columns", async () => {
    const { shop } = await createShopWithCase(getModels());
    await expect(
      commitSpecImport({ shopId: shop.id, actorId: null, csv: "make,model\nMazda,3" }),
    ).rejects.toMatchObject({
      status: 400,
    });
  });
});

describe("spec table scoping and edits", () => {
  const row = {
    yearFrom: 2012,
    yearTo: 2016,
    make: "Mazda",
    model: "3",
    variant: "",
    rearAc: false,
    refrigerant: "R-134a" as const,
    labelChargeG: 500,
    oilType: "PAG 46",
    totalOilMl: 120,
  };

  it("answers 404 for another shop's row and vehicle, 409 for a duplicate", async () => {
    const a = await createShopWithCase(getModels());
    const b = await createShopWithCase(getModels());
    const mine = await createSpec({ shopId: a.shop.id, actorId: null, input: row });
    await expect(
      createSpec({ shopId: a.shop.id, actorId: null, input: { ...row, make: "MAZDA" } }),
    ).rejects.toMatchObject({
      status: 409,
    });
    await expect(
      updateSpec({ shopId: b.shop.id, actorId: null, id: mine.id, input: row }),
    ).rejects.toMatchObject({
      status: 404,
    });
    await expect(deleteSpec({ shopId: b.shop.id, actorId: null, id: mine.id })).rejects.toMatchObject({
      status: 404,
    });
    await expect(
      listSpecMatchesForVehicle({ shopId: b.shop.id, vehicleId: a.vehicle.id }),
    ).rejects.toMatchObject({ status: 404 });
    const found = await listSpecMatchesForVehicle({ shopId: a.shop.id, vehicleId: a.vehicle.id }); // a 2015 Mazda 3
    expect(found.matches.map((m) => m.row.id)).toEqual([mine.id]);
    expect((await listSpecMatchesForVehicle({ shopId: b.shop.id, vehicleId: b.vehicle.id })).matches).toEqual(
      [],
    );
  });
});
