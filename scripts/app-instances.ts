// Several production servers (`next start`, each on its own port) against one database, as they
// would run behind a load balancer. Used by the browser tests that prove sign-in throttling,
// autosave versions and the like hold across instances, and by hand:
//
//   npx next build                       # once; the instances serve that build
//   DATABASE_URL=… npx tsx scripts/app-instances.ts 2
//
// Each instance gets the same APP_ORIGIN (the balancer's) and trusts one proxy hop, so a test can
// play the balancer by sending X-Forwarded-For.
import { spawn, type ChildProcess } from "node:child_process";
import { createServer } from "node:net";
import path from "node:path";

const REPO = path.resolve(__dirname, "..");
const START_TIMEOUT_MS = 60_000;

export interface AppInstance {
  port: number;
  baseUrl: string;
  process: ChildProcess;
  /** What the server printed, for a failing test's message. */
  output(): string;
}

export interface AppInstances {
  instances: AppInstance[];
  /** The origin every instance takes as its own (the balancer's). */
  appOrigin: string;
  stop(): Promise<void>;
}

export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = createServer();
    server.once("error", reject);
    server.listen(0, "127.0.0.1", () => {
      const address = server.address();
      server.close(() =>
        typeof address === "object" && address ? resolve(address.port) : reject(new Error("no port")),
      );
    });
  });
}

async function waitForHealth(instance: AppInstance, deadline: number): Promise<void> {
  while (Date.now() < deadline) {
    if (instance.process.exitCode !== null)
      throw new Error(`instance on ${instance.port} exited:\n${instance.output()}`);
    try {
      const response = await fetch(`${instance.baseUrl}/api/health`);
      if (response.ok) return;
    } catch {
      // not listening yet
    }
    await new Promise((resolve) => setTimeout(resolve, 200));
  }
  throw new Error(
    `instance on ${instance.port} did not answer within ${START_TIMEOUT_MS} ms:\n${instance.output()}`,
  );
}

function stopProcess(child: ChildProcess): Promise<void> {
  if (child.exitCode !== null || child.signalCode !== null) return Promise.resolve();
  return new Promise((resolve) => {
    const kill = setTimeout(() => child.kill("SIGKILL"), 10_000);
    child.once("exit", () => {
      clearTimeout(kill);
      resolve();
    });
    child.kill("SIGTERM");
  });
}

/** Starts `count` instances of the built app against `databaseUrl`; resolves once all answer. */
export async function startAppInstances({
  count,
  databaseUrl,
  appOrigin,
  env = {},
}: {
  count: number;
  databaseUrl: string;
  /** Defaults to the first instance's own address. */
  appOrigin?: string;
  env?: Record<string, string>;
}): Promise<AppInstances> {
  const ports = [];
  for (let i = 0; i < count; i += 1) ports.push(await freePort());
  const origin = appOrigin ?? `http://127.0.0.1:${ports[0]}`;
  const instances: AppInstance[] = ports.map((port) => {
    let log = "";
    const child = spawn(
      path.join(REPO, "node_modules/.bin/next"),
      ["start", "-H", "127.0.0.1", "-p", String(port)],
      {
        cwd: REPO,
        env: {
          ...process.env,
          NODE_ENV: "production",
          NEXT_TELEMETRY_DISABLED: "1",
          DATABASE_URL: databaseUrl,
          APP_ORIGIN: origin,
          TRUSTED_PROXY: "1",
          ...env,
        },
        stdio: ["ignore", "pipe", "pipe"],
      },
    );
    const keep = (chunk: Buffer) => {
      log = (log + chunk.toString()).slice(-20_000);
    };
    child.stdout?.on("data", keep);
    child.stderr?.on("data", keep);
    return { port, baseUrl: `http://127.0.0.1:${port}`, process: child, output: () => log };
  });
  const stop = async () => {
    await Promise.all(instances.map((i) => stopProcess(i.process)));
  };
  try {
    const deadline = Date.now() + START_TIMEOUT_MS;
    await Promise.all(instances.map((i) => waitForHealth(i, deadline)));
  } catch (error) {
    await stop();
    throw error;
  }
  return { instances, appOrigin: origin, stop };
}

async function main() {
  const count = Number(process.argv[2] ?? 2);
  const databaseUrl = process.env.DATABASE_URL;
  if (!databaseUrl || !Number.isInteger(count) || count < 1) {
    console.error(
      "usage: DATABASE_URL=<scripts/db.sh url> [APP_ORIGIN=<origin>] npx tsx scripts/app-instances.ts [COUNT]",
    );
    process.exit(2);
  }
  const started = await startAppInstances({ count, databaseUrl, appOrigin: process.env.APP_ORIGIN });
  for (const i of started.instances) console.log(`instance pid ${i.process.pid}: ${i.baseUrl}`);
  console.log(`APP_ORIGIN for all: ${started.appOrigin}. Ctrl-C stops them.`);
  const shutdown = () => void started.stop().then(() => process.exit(0));
  process.on("SIGINT", shutdown);
  process.on("SIGTERM", shutdown);
}

if (require.main === module) void main();
