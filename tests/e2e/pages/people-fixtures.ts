import { randomBytes } from "node:crypto";
import { hash } from "@node-rs/argon2";
import mysql from "mysql2/promise";
import { E2E_DB_PORT } from "./e2e-env";

/**
 * A technician of the demo shop made for one test, straight in the e2e database, so that
 * resetting or changing their password never touches the demo accounts other specs sign in with.
 */
export async function createTechnician(
  password: string,
): Promise<{ id: string; email: string; name: string }> {
  const connection = await mysql.createConnection({
    host: "127.0.0.1",
    port: E2E_DB_PORT,
    user: "chillwright",
    password: "chillwright-dev",
    database: "chillwright_e2e",
  });
  try {
    const suffix = randomBytes(4).toString("hex");
    const person = {
      id: `e2e${suffix}person`,
      email: `reset-${suffix}@harbourline.test`,
      name: `Rowan Test ${suffix}`,
    };
    const [shops] = await connection.query("SELECT id FROM shop WHERE name = 'Harbourline Auto Climate'");
    const shopId = (shops as { id: number }[])[0]?.id;
    if (!shopId) throw new Error("the demo shop is missing");
    // argon2id, as the app stores it (lib/auth/password.ts).
    const passwordHash = await hash(password, {
      algorithm: 2,
      memoryCost: 19456,
      timeCost: 2,
      parallelism: 1,
    });
    await connection.query(
      "INSERT INTO `user` (id, shop_id, email, name, password_hash, role, active, created_at, updated_at) VALUES (?, ?, ?, ?, ?, 'technician', 1, NOW(3), NOW(3))",
      [person.id, shopId, person.email, person.name, passwordHash],
    );
    return person;
  } finally {
    await connection.end();
  }
}
