// A local S3-compatible store for spec-sheet uploads (s3rver), used by npm start and the tests.
import { mkdirSync } from "node:fs";
import S3rver from "s3rver";

export async function startS3Fake(opts: { port: number; directory: string; bucket: string }) {
  mkdirSync(opts.directory, { recursive: true });
  const server = new S3rver({
    port: opts.port, address: "127.0.0.1", directory: opts.directory, silent: true,
    configureBuckets: [{ name: opts.bucket, configs: [] }],
  });
  await server.run();
  return {
    endpoint: `http://127.0.0.1:${opts.port}`,
    stop: async () => { await server.close(); },
  };
}
