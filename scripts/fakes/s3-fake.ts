import { mkdirSync } from "node:fs";
import path from "node:path";
// @ts-expect-error -- s3rver ships no types; we use its constructor, run() and close() only.
import S3rver from "s3rver";

// A local S3-compatible store for development and tests (loopback only, files in a folder).

export interface S3Fake {
  port: number;
  endpoint: string;
  close: () => Promise<void>;
}

export async function startS3Fake({
  port = 0,
  dir,
  bucket,
}: {
  port?: number;
  dir: string;
  bucket: string;
}): Promise<S3Fake> {
  mkdirSync(dir, { recursive: true });
  const server = new S3rver({
    port,
    address: "127.0.0.1",
    directory: dir,
    silent: true,
    configureBuckets: [{ name: bucket }],
  });
  const address = (await server.run()) as { port: number };
  return {
    port: address.port,
    endpoint: `http://127.0.0.1:${address.port}`,
    close: () => server.close() as Promise<void>,
  };
}

// CLI: tsx scripts/fakes/s3-fake.ts --port 4569 --dir .data/s3 --bucket chillwright-photos
if (process.argv[1] && path.resolve(process.argv[1]) === path.resolve(__filename)) {
  const arg = (name: string, fallback: string) => {
    const i = process.argv.indexOf(`--${name}`);
    return i > 0 ? (process.argv[i + 1] ?? fallback) : fallback;
  };
  startS3Fake({
    port: Number(arg("port", "4569")),
    dir: path.resolve(arg("dir", ".data/s3")),
    bucket: arg("bucket", "chillwright-photos"),
  }).then(
    (s) => {
      console.log(`S3 fake: ${s.endpoint} (objects kept in ${path.resolve(arg("dir", ".data/s3"))})`);
      const stop = () => void s.close().then(() => process.exit(0));
      process.on("SIGTERM", stop);
      process.on("SIGINT", stop);
    },
    (error) => {
      console.error("S3 fake could not start:", error);
      process.exit(1);
    },
  );
}
