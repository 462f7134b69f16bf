import type { APIRequestContext } from "@playwright/test";
import mysql from "mysql2/promise";
import sharp from "sharp";
import { E2E_DB_PORT } from "./e2e-env";

/** The demo case the owner-page tests start from (invented: overcharged after a top-up elsewhere). */
export async function caseIdByVehicle(client: APIRequestContext, vehicle: string): Promise<number> {
  const { cases } = (await (await client.get("/api/cases")).json()) as {
    cases: { id: number; vehicle: string | null }[];
  };
  const found = cases.find((c) => c.vehicle?.includes(vehicle));
  if (!found) throw new Error(`the demo ${vehicle} case is missing`);
  return found.id;
}

/** A photo as a phone writes it: JPEG with EXIF, 2000 × 1500 px. */
export async function phonePhoto(): Promise<Buffer> {
  return sharp({
    create: {
      width: 2000,
      height: 1500,
      channels: 3,
      background: "#0a6fa6",
      noise: { type: "gaussian", mean: 120, sigma: 30 },
    },
  })
    .jpeg({ quality: 80 })
    .withExif({ IFD0: { Make: "E2EPhone" } })
    .toBuffer();
}

/** Marks a case as submitted and signed off straight in the e2e database (for another shop's link). */
export async function markSignedOff(caseId: number): Promise<void> {
  const connection = await mysql.createConnection({
    host: "127.0.0.1",
    port: E2E_DB_PORT,
    user: "chillwright",
    password: "chillwright-dev",
    database: "chillwright_e2e",
  });
  try {
    await connection.query("UPDATE service_case SET status = 'signed_off' WHERE id = ?", [caseId]);
  } finally {
    await connection.end();
  }
}

export function tokenOf(url: string): string {
  const match = url.match(/\/s\/([A-Za-z0-9_-]{43})/);
  if (!match?.[1]) throw new Error(`no owner link in ${url}`);
  return match[1];
}
