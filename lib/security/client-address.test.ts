import { describe, expect, it } from "vitest";
import { clientAddress } from "./client-address";

describe("clientAddress: who is asking, as far as our proxies can vouch", () => {
  it("ignores X-Forwarded-For entirely when no proxy is trusted", () => {
    expect(clientAddress("203.0.113.7", 0)).toBeNull();
    expect(clientAddress(null, 1)).toBeNull();
    expect(clientAddress("", 1)).toBeNull();
  });

  it("takes the entry our one proxy appended, not what the client wrote before it", () => {
    expect(clientAddress("203.0.113.7", 1)).toBe("203.0.113.7");
    // The client sent "X-Forwarded-For: 10.9.9.9"; the proxy appended the real peer.
    expect(clientAddress("10.9.9.9, 203.0.113.7", 1)).toBe("203.0.113.7");
    expect(clientAddress("1.1.1.1,2.2.2.2,  203.0.113.7 ", 1)).toBe("203.0.113.7");
  });

  it("counts from the right past each trusted proxy", () => {
    expect(clientAddress("10.9.9.9, 203.0.113.7, 198.51.100.2", 2)).toBe("203.0.113.7");
    expect(clientAddress("198.51.100.2", 2)).toBeNull();
  });

  it("accepts IPv6 and strips ports, refuses anything that is not an address", () => {
    expect(clientAddress("2001:DB8::1", 1)).toBe("2001:db8::1");
    expect(clientAddress("[2001:db8::1]:443", 1)).toBe("2001:db8::1");
    expect(clientAddress("203.0.113.7:51000", 1)).toBe("203.0.113.7");
    for (const bad of ["unknown", "evil.example", "<script>", "203.0.113.7; drop", "x".repeat(60)])
      expect(clientAddress(bad, 1), bad).toBeNull();
  });
});
