import * as mariadb from "mariadb";

// Sequelize 6's mariadb dialect runs `delete rows.meta` on every raw query, but connector 3.1+
// defines `meta` as non-configurable, so any raw SELECT throws "Cannot delete property 'meta'"
// (sequelize/sequelize#15701, mariadb-corporation/mariadb-connector-nodejs#234). Until Sequelize
// handles it, hand Sequelize a driver whose query results carry a deletable `meta`.

type QueryFn = mariadb.Connection["query"];

function withDeletableMeta(result: unknown): unknown {
  if (!Array.isArray(result)) return result;
  const descriptor = Object.getOwnPropertyDescriptor(result, "meta");
  if (!descriptor || descriptor.configurable) return result;
  const rows: unknown[] = Array.from(result);
  Object.defineProperty(rows, "meta", { ...descriptor, configurable: true });
  return rows;
}

export const mariadbDriver = {
  ...mariadb,
  async createConnection(config: mariadb.ConnectionConfig): Promise<mariadb.Connection> {
    const connection = await mariadb.createConnection(config);
    const query = connection.query.bind(connection) as (...args: Parameters<QueryFn>) => Promise<unknown>;
    connection.query = (async (...args: Parameters<QueryFn>) =>
      withDeletableMeta(await query(...args))) as QueryFn;
    return connection;
  },
};
