/**
 * A local S3-compatible server (s3rver) for development, the demo and tests:
 * listens on 127.0.0.1 only, keeps objects in a folder, and creates the bucket
 * on start. The app talks to it through @aws-sdk/client-s3 exactly as it would
 * to real object storage (lib/storage/s3.ts).
 *   BARWRIGHT_S3_PORT (default 4568), BARWRIGHT_S3_DIR (default .data/s3),
 *   BARWRIGHT_S3_BUCKET (default barwright)
 */
import { mkdirSync } from "node:fs";
import path from "node:path";
import S3rver from "s3rver";

export type FakeS3 = { close: () => Promise<void>; port: number };

export async function startFakeS3(opts: { port: number; dir: string; bucket: string }): Promise<FakeS3> {
  mkdirSync(opts.dir, { recursive: true });
  const server = new S3rver({
    address: "127.0.0.1",
    port: opts.port,
    silent: true,
    directory: opts.dir,
    // Path-style only: bucket names never need a DNS name.
    vhostBuckets: false,
    configureBuckets: [{ name: opts.bucket, configs: [] }],
  });
  await server.run();
  return { port: opts.port, close: () => server.close() };
}

const isMain = process.argv[1] && path.resolve(process.argv[1]).endsWith(path.join("scripts", "fake-s3.ts"));
if (isMain) {
  const port = Number(process.env.BARWRIGHT_S3_PORT ?? 4568);
  const dir = path.resolve(process.env.BARWRIGHT_S3_DIR ?? ".data/s3");
  const bucket = process.env.BARWRIGHT_S3_BUCKET ?? "barwright";
  startFakeS3({ port, dir, bucket })
    .then(() => console.log(`fake-s3: S3 on http://127.0.0.1:${port}, bucket “${bucket}”, objects in ${dir}`))
    .catch((err: NodeJS.ErrnoException) => {
      console.error(
        err.code === "EADDRINUSE"
          ? `fake-s3: port ${port} on 127.0.0.1 is already in use. Stop that program or set BARWRIGHT_S3_PORT.`
          : `fake-s3: could not start: ${err.message}`,
      );
      process.exit(1);
    });
}
