import { describe, expect, it } from "vitest";
import { isDatabaseUnavailable } from "./unavailable";

function wrapped(name: string, parent: object) {
  return Object.assign(new Error("wrapped"), { name, parent, original: parent });
}

describe("isDatabaseUnavailable", () => {
  it("recognises a stopped, restarting or saturated database through the drivers' wrappers", () => {
    const refused = Object.assign(new Error("connect ECONNREFUSED"), { code: "ECONNREFUSED" });
    expect(isDatabaseUnavailable(refused)).toBe(true);
    expect(isDatabaseUnavailable(wrapped("SequelizeConnectionRefusedError", refused))).toBe(true);
    const closed = Object.assign(new Error("socket closed"), { code: "ER_SOCKET_UNEXPECTED_CLOSE" });
    expect(isDatabaseUnavailable(wrapped("SequelizeDatabaseError", closed))).toBe(true);
    expect(isDatabaseUnavailable(new Error("x", { cause: { code: "PROTOCOL_CONNECTION_LOST" } }))).toBe(true);
  });

  it("leaves a wrong query, a constraint or a plain bug to the generic path", () => {
    const syntax = Object.assign(new Error("syntax"), { code: "ER_PARSE_ERROR" });
    expect(isDatabaseUnavailable(wrapped("SequelizeDatabaseError", syntax))).toBe(false);
    expect(isDatabaseUnavailable(wrapped("SequelizeUniqueConstraintError", { code: "ER_DUP_ENTRY" }))).toBe(
      false,
    );
    expect(isDatabaseUnavailable(new TypeError("undefined is not a function"))).toBe(false);
    expect(isDatabaseUnavailable(null)).toBe(false);
  });
});
