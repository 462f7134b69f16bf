import { Mysql2Adapter } from "@lucia-auth/adapter-mysql";
import { afterAll, describe, expect, it } from "vitest";
import { closeMysqlPool, getMysqlPool } from "@/lib/db/pool";
import { OneReadMysql2Adapter } from "@/lib/auth/lucia";
import { closeSequelize } from "@/lib/db/sequelize";
import { getModels } from "@/models";
import { createShopWithCase } from "./fixtures";
import "./helpers";

type ColumnRow = { name: string; type: string; nullable: string; columnKey: string };

afterAll(async () => {
  await closeMysqlPool();
  await closeSequelize();
});

describe("user_session, the table Lucia v3's MySQL adapter reads and writes", () => {
  it("has exactly id, user_id and expires_at in the adapter's documented shape", async () => {
    const [columns] = await getMysqlPool().query(
      `SELECT column_name AS name, column_type AS type, is_nullable AS nullable, column_key AS columnKey
         FROM information_schema.columns WHERE table_schema = DATABASE() AND table_name = 'user_session'
         ORDER BY ordinal_position`,
    );
    expect(columns as ColumnRow[]).toEqual([
      { name: "id", type: "varchar(255)", nullable: "NO", columnKey: "PRI" },
      { name: "user_id", type: "varchar(40)", nullable: "NO", columnKey: "MUL" },
      { name: "expires_at", type: "datetime", nullable: "NO", columnKey: "" },
    ]);
  });

  it("references user(id) and is deleted with its user", async () => {
    const [rules] = await getMysqlPool().query(
      `SELECT rc.referenced_table_name AS refTable, rc.delete_rule AS onDelete, k.referenced_column_name AS refColumn
         FROM information_schema.referential_constraints rc
         JOIN information_schema.key_column_usage k
           ON k.constraint_schema = rc.constraint_schema AND k.constraint_name = rc.constraint_name
        WHERE rc.constraint_schema = DATABASE() AND rc.table_name = 'user_session'`,
    );
    expect(rules).toEqual([{ refTable: "user", onDelete: "CASCADE", refColumn: "id" }]);
  });

  it("round-trips a session through the Lucia adapter on the mysql2 pool, in UTC", async () => {
    const models = getModels();
    const { technician, shop } = await createShopWithCase(models);
    const adapter = new Mysql2Adapter(getMysqlPool(), { user: "user", session: "user_session" });
    const expiresAt = new Date(Date.now() + 30 * 24 * 3600 * 1000);
    expiresAt.setMilliseconds(0); // DATETIME without fractions, as Lucia's table defines it
    const sessionId = `test-session-${technician.id}`;

    await adapter.setSession({ id: sessionId, userId: technician.id, expiresAt, attributes: {} });
    const [session, user] = await adapter.getSessionAndUser(sessionId);
    expect(session?.expiresAt.toISOString()).toBe(expiresAt.toISOString());
    expect(user?.id).toBe(technician.id);
    expect(user?.attributes).toMatchObject({ email: technician.email, role: "technician", shop_id: shop.id });

    // The Sequelize model reads the same instant.
    const viaModel = await models.Session.findByPk(sessionId);
    expect(viaModel?.expiresAt.toISOString()).toBe(expiresAt.toISOString());

    // A user with no cases (cases RESTRICT deleting their technician): its sessions go with it.
    const loner = await models.User.create({
      id: `${technician.id.slice(0, 10)}-lone`,
      shopId: shop.id,
      email: `lone-${technician.email}`,
      name: "Lone User",
      passwordHash: "x",
      role: "apprentice",
    });
    await adapter.setSession({ id: `${sessionId}-2`, userId: loner.id, expiresAt, attributes: {} });
    await loner.destroy();
    expect((await adapter.getSessionAndUser(`${sessionId}-2`))[0]).toBeNull();
    expect((await adapter.getSessionAndUser(sessionId))[0]?.userId).toBe(technician.id);
  });

  it("deletes expired sessions and keeps live ones", async () => {
    const models = getModels();
    const { technician } = await createShopWithCase(models);
    const adapter = new Mysql2Adapter(getMysqlPool(), { user: "user", session: "user_session" });
    await adapter.setSession({
      id: `old-${technician.id}`,
      userId: technician.id,
      expiresAt: new Date(Date.now() - 60_000),
      attributes: {},
    });
    await adapter.setSession({
      id: `new-${technician.id}`,
      userId: technician.id,
      expiresAt: new Date(Date.now() + 3_600_000),
      attributes: {},
    });
    await adapter.deleteExpiredSessions();
    const left = (await adapter.getUserSessions(technician.id)).map((s) => s.id);
    expect(left).toEqual([`new-${technician.id}`]);
  });

  it("reads a session and its user in one query as the stock adapter reads them in two", async () => {
    const models = getModels();
    const { technician, shop } = await createShopWithCase(models);
    const stock = new Mysql2Adapter(getMysqlPool(), { user: "user", session: "user_session" });
    const ours = new OneReadMysql2Adapter(getMysqlPool());
    const expiresAt = new Date(Date.now() + 3_600_000);
    expiresAt.setMilliseconds(0);
    const sessionId = `one-read-${technician.id}`;
    await stock.setSession({ id: sessionId, userId: technician.id, expiresAt, attributes: {} });

    const [session, user] = await ours.getSessionAndUser(sessionId);
    const [stockSession, stockUser] = await stock.getSessionAndUser(sessionId);
    expect(session).toEqual(stockSession);
    expect(user?.id).toBe(stockUser?.id);
    const picked = ["email", "name", "role", "shop_id", "active"] as const;
    expect(user?.attributes).toEqual(Object.fromEntries(picked.map((k) => [k, stockUser?.attributes[k]])));
    expect(user?.attributes).toMatchObject({ role: "technician", shop_id: shop.id });
    // Never the password hash or the person's settings.
    expect(Object.keys(user?.attributes ?? {}).sort()).toEqual([...picked].sort());

    expect(await ours.getSessionAndUser(`no-such-${sessionId}`)).toEqual([null, null]);
  });
});
