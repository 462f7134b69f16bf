import { NextRequest } from "next/server";
import { afterAll, describe, expect, it } from "vitest";
import { GET } from "@/app/api/vehicles/route";
import { getLucia } from "@/lib/auth/lucia";
import type { VehicleChoice } from "@/lib/contracts/vehicles";
import { closeMysqlPool } from "@/lib/db/pool";
import { closeSequelize } from "@/lib/db/sequelize";
import { getModels } from "@/models";
import { createShopWithCase } from "./fixtures";
import "./helpers";

afterAll(async () => {
  await closeMysqlPool();
  await closeSequelize();
});

const ORIGIN = "http://127.0.0.1:3000";

async function search(sessionId: string, q: string) {
  const res = await GET(
    new NextRequest(`${ORIGIN}/api/vehicles?q=${encodeURIComponent(q)}`, {
      headers: { host: "127.0.0.1:3000", cookie: `cw_session=${sessionId}` },
    }),
    { params: Promise.resolve({}) },
  );
  return { status: res.status, body: (await res.json()) as { vehicles?: VehicleChoice[] } };
}

describe("the new-case vehicle search", () => {
  it("finds a vehicle by plate, VIN, the customer's phone or name, or make and model, in this shop only", async () => {
    const models = getModels();
    const mine = await createShopWithCase(models);
    await mine.vehicle.update({ plate: "7KJ214", vin: "1HGCM82633A004352" });
    await mine.customer.update({ name: "Odile Marchetti", phone: "(902) 555-0147" });
    // Another shop's vehicle with the same plate and phone is never found.
    const other = await createShopWithCase(models);
    await other.vehicle.update({ plate: "7KJ214" });
    await other.customer.update({ name: "Odile Marchetti", phone: "902 555 0147" });
    const session = await getLucia().createSession(mine.technician.id, {});

    for (const q of ["7kj-214", "7KJ 214", "A004352", "555-0147", "5550147", "marchetti", "Mazda 3"]) {
      const { status, body } = await search(session.id, q);
      expect(status, q).toBe(200);
      expect(
        body.vehicles?.map((v) => v.vehicleId),
        q,
      ).toEqual([mine.vehicle.id]);
      expect(body.vehicles?.[0]).toMatchObject({ plate: "7KJ214", customerPhone: "(902) 555-0147" });
    }
    expect((await search(session.id, "ZZZ999")).body.vehicles).toEqual([]);
    // Two digits are too few to search phone numbers by.
    expect((await search(session.id, "01")).body.vehicles).toEqual([]);
  });

  it("answers 401 without a session and 400 for an over-long search", async () => {
    const mine = await createShopWithCase(getModels());
    const session = await getLucia().createSession(mine.technician.id, {});
    expect((await search("no-such-session", "7KJ")).status).toBe(401);
    expect((await search(session.id, "x".repeat(81))).status).toBe(400);
  });
});
