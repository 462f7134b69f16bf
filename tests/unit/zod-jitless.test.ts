import { describe, expect, it } from "vitest";

// The browser's side (no eval probe reported under the CSP) is walked by tests/e2e/security-headers.spec.ts.
describe("zod's jitless flag, set before any of our code runs in the browser", () => {
  it("is the flag zod's own settings read, without importing zod on every page", async () => {
    await import("@/instrumentation-client");
    const { config } = await import("zod/v4/core");
    expect(config().jitless).toBe(true);
  });
});
