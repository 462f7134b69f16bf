// The throwaway app the browser benches measure, and the scripts a page loads. Shared by
// bench/interview-screen.ts and bench/floor.ts.
import { spawn, type ChildProcess } from "node:child_process";
import { gzipSync } from "node:zlib";
import type { Page } from "@playwright/test";

export const APP_PORT = Number(process.env.E2E_PORT ?? 3100);
export const APP_BASE = process.env.BENCH_URL ?? `http://127.0.0.1:${APP_PORT}`;

export interface BenchApp {
  /** The pid of scripts/e2e-server.sh (the app, its database and the fakes are below it); none for BENCH_URL. */
  pid: number | undefined;
  stop(): Promise<void>;
}

/**
 * scripts/e2e-server.sh (a throwaway MariaDB with demo data and the production build on E2E_PORT) unless
 * BENCH_URL points at a running server; resolves once /api/health answers.
 */
export async function startBenchApp(timeoutMs = 180_000): Promise<BenchApp> {
  const server: ChildProcess | undefined = process.env.BENCH_URL
    ? undefined
    : spawn("bash", ["scripts/e2e-server.sh"], { stdio: "ignore" });
  const app: BenchApp = {
    pid: server?.pid,
    async stop() {
      // e2e-server.sh stops the app and its database when it is told to stop.
      if (!server || server.exitCode !== null) return;
      const exited = new Promise((resolve) => server.once("exit", resolve));
      server.kill("SIGTERM");
      await exited;
    },
  };
  const until = Date.now() + timeoutMs;
  for (;;) {
    try {
      if ((await fetch(`${APP_BASE}/api/health`)).ok) return app;
    } catch {
      // not up yet
    }
    if (Date.now() > until) {
      await app.stop();
      throw new Error(`no server at ${APP_BASE}`);
    }
    await new Promise((r) => setTimeout(r, 500));
  }
}

/** Every script the page loads from the app from now on: URL → gzip size, as a server would send it. */
export function recordScripts(page: Page): Map<string, number> {
  const scripts = new Map<string, number>();
  page.on("response", async (response) => {
    if (response.request().resourceType() !== "script" || !response.url().startsWith(APP_BASE)) return;
    try {
      scripts.set(response.url(), gzipSync(await response.body()).length);
    } catch {
      // a redirected or aborted response has no body
    }
  });
  return scripts;
}

export const totalKb = (scripts: Map<string, number>) =>
  [...scripts.values()].reduce((a, b) => a + b, 0) / 1024;
