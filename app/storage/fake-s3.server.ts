/**
 * A real S3-compatible listener (s3rver) for development, the demo and the tests, keeping its
 * objects under `${DATA_DIR}/s3`. It refuses any access key id but the fixed one below (it does
 * not check V4 signatures). Never for production.
 */
import path from "node:path";
import S3rver from "s3rver";
import { config } from "~/lib/config.server";

/** The credentials s3rver accepts. */
export const FAKE_S3_CREDENTIALS = { accessKeyId: "S3RVER", secretAccessKey: "S3RVER" };
export const FAKE_S3_BUCKET = "loftline-files";

export type FakeS3 = {
  port: number;
  endpoint: string;
  bucket: string;
  dir: string;
  /** The environment that points the app at it. */
  env: Record<string, string>;
  close: () => Promise<void>;
};

/** Starts the listener with the bucket made. `port: 0` picks a free port (tests). */
export async function startFakeS3(
  opts: { port?: number; dir?: string; bucket?: string } = {},
): Promise<FakeS3> {
  const dir = opts.dir ?? path.join(config.dataDir, "s3");
  const bucket = opts.bucket ?? FAKE_S3_BUCKET;
  const server = new S3rver({
    address: "127.0.0.1",
    port: opts.port ?? 4568,
    silent: true,
    directory: dir,
    configureBuckets: [{ name: bucket }],
  });
  const { port } = await server.run();
  const endpoint = `http://127.0.0.1:${port}`;
  return {
    port,
    endpoint,
    bucket,
    dir,
    env: {
      FILE_STORE: "s3",
      S3_ENDPOINT: endpoint,
      S3_BUCKET: bucket,
      S3_REGION: "us-east-1",
      S3_ACCESS_KEY_ID: FAKE_S3_CREDENTIALS.accessKeyId,
      S3_SECRET_ACCESS_KEY: FAKE_S3_CREDENTIALS.secretAccessKey,
    },
    close: () => server.close(),
  };
}
