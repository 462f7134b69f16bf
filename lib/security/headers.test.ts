import path from "node:path";
import { pathToFileURL } from "node:url";
import type { NextConfig } from "next";
import { describe, expect, it } from "vitest";
import {
  API_CACHE_CONTROL,
  API_CONTENT_SECURITY_POLICY,
  PERMISSIONS_POLICY,
  STATIC_SECURITY_HEADERS,
  createNonce,
  pageContentSecurityPolicy,
} from "./headers";

const directives = (policy: string) =>
  new Map(
    policy.split(";").map((d) => {
      const [name = "", ...values] = d.trim().split(/\s+/);
      return [name, values] as const;
    }),
  );

describe("security headers", () => {
  it("next.config.mjs sends the same static headers as the proxy, on every path", async () => {
    const configUrl = pathToFileURL(path.resolve(__dirname, "../../next.config.mjs")).href;
    const nextConfig = ((await import(configUrl)) as { default: NextConfig }).default;
    const rules = await nextConfig.headers!();
    expect(rules).toHaveLength(2);
    expect(rules[0]!.source).toBe("/:path*");
    expect(Object.fromEntries(rules[0]!.headers.map((h) => [h.key, h.value]))).toEqual(
      STATIC_SECURITY_HEADERS,
    );
    // API answers never pass through the proxy: their policy and no-store come from the config.
    expect(rules[1]!.source).toBe("/api/:path*");
    expect(Object.fromEntries(rules[1]!.headers.map((h) => [h.key, h.value]))).toEqual({
      "Content-Security-Policy": API_CONTENT_SECURITY_POLICY,
      "Cache-Control": API_CACHE_CONTROL,
    });
  });

  it("allows the camera for our own pages and turns every other listed feature off", () => {
    const features = PERMISSIONS_POLICY.split(", ");
    expect(features).toContain("camera=(self)");
    for (const feature of features.filter((f) => !f.startsWith("camera=")))
      expect(feature).toMatch(/^[a-z-]+=\(\)$/);
    for (const name of ["microphone", "geolocation", "payment", "usb"])
      expect(features).toContain(`${name}=()`);
  });

  it("page policy: nonce-only scripts, no eval in production, same-origin and blob: images, no framing", () => {
    const policy = directives(
      pageContentSecurityPolicy({ nonce: "abc123", development: false, https: false }),
    );
    expect(policy.get("script-src")).toEqual(["'self'", "'nonce-abc123'", "'strict-dynamic'"]);
    expect(policy.get("style-src")).toEqual(["'self'", "'nonce-abc123'"]);
    expect(policy.get("style-src-attr")).toEqual(["'unsafe-inline'"]);
    expect(policy.get("img-src")).toEqual(["'self'", "blob:", "data:"]);
    expect(policy.get("connect-src")).toEqual(["'self'"]);
    expect(policy.get("frame-ancestors")).toEqual(["'none'"]);
    expect(policy.get("object-src")).toEqual(["'none'"]);
    expect(policy.has("upgrade-insecure-requests")).toBe(false);
    // No third-party origin anywhere in the policy.
    for (const values of policy.values())
      for (const value of values) expect(value).toMatch(/^('[a-z-]+'|'nonce-abc123'|blob:|data:)$/);
  });

  it("development adds eval for React's error overlay; HTTPS adds upgrade-insecure-requests", () => {
    const dev = directives(pageContentSecurityPolicy({ nonce: "n", development: true, https: true }));
    expect(dev.get("script-src")).toContain("'unsafe-eval'");
    expect(dev.has("upgrade-insecure-requests")).toBe(true);
  });

  it("API answers load nothing and cannot be framed", () => {
    const policy = directives(API_CONTENT_SECURITY_POLICY);
    expect(policy.get("default-src")).toEqual(["'none'"]);
    expect(policy.get("frame-ancestors")).toEqual(["'none'"]);
  });

  it("makes a fresh 128-bit nonce each time", () => {
    const nonces = new Set(Array.from({ length: 200 }, createNonce));
    expect(nonces.size).toBe(200);
    for (const nonce of nonces) expect(Buffer.from(nonce, "base64")).toHaveLength(16);
  });
});
