// Whether an error means "the database is not answering" (stopped, restarting, unreachable, out of
// connections) rather than "this request is wrong": the first is worth a 503 and a retry, the
// second is a bug to log. Sequelize wraps the mariadb connector's errors; Lucia's sessions go
// through mysql2; both are recognised by their class names and socket or server codes.

const SEQUELIZE_CONNECTION_ERRORS = new Set([
  "SequelizeConnectionError",
  "SequelizeConnectionRefusedError",
  "SequelizeConnectionAcquireTimeoutError",
  "SequelizeConnectionTimedOutError",
  "SequelizeHostNotFoundError",
  "SequelizeHostNotReachableError",
  "SequelizeAccessDeniedError",
]);

const CONNECTION_CODES = new Set([
  "ECONNREFUSED",
  "ECONNRESET",
  "EPIPE",
  "ETIMEDOUT",
  "EHOSTUNREACH",
  "ENOTFOUND",
  "PROTOCOL_CONNECTION_LOST",
  "PROTOCOL_SEQUENCE_TIMEOUT",
  "ER_CON_COUNT_ERROR",
  "ER_SERVER_SHUTDOWN",
  "ER_SOCKET_UNEXPECTED_CLOSE",
  "ER_GET_CONNECTION_TIMEOUT",
  "ER_CONNECTION_TIMEOUT",
  "ER_CONNECTION_ALREADY_CLOSED",
  "ER_CMD_CONNECTION_CLOSED",
  "ER_CLOSING_POOL",
  "ER_POOL_ALREADY_CLOSED",
  "ER_SOCKET_TIMEOUT",
  "ER_SOCKET_DESTROYED",
]);

export function isDatabaseUnavailable(error: unknown): boolean {
  // Follow the chain the drivers build (Sequelize: parent/original; Node: cause), a few links deep.
  let current: unknown = error;
  for (let depth = 0; depth < 5 && current && typeof current === "object"; depth += 1) {
    const e = current as {
      name?: unknown;
      code?: unknown;
      parent?: unknown;
      original?: unknown;
      cause?: unknown;
    };
    if (typeof e.name === "string" && SEQUELIZE_CONNECTION_ERRORS.has(e.name)) return true;
    if (typeof e.code === "string" && CONNECTION_CODES.has(e.code)) return true;
    current = e.parent ?? e.original ?? e.cause;
  }
  return false;
}
