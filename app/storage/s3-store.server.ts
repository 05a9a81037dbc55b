/**
 * The S3 file store: any S3-compatible service through the AWS SDK, path-style addressing, one
 * bucket. Checksums are computed and checked only where the API requires them, so S3-compatible
 * stores that do not know the newer checksum headers keep exactly the bytes sent.
 */
import {
  DeleteObjectCommand,
  GetObjectCommand,
  HeadBucketCommand,
  ListObjectsV2Command,
  PutObjectCommand,
  S3Client,
  S3ServiceException,
} from "@aws-sdk/client-s3";
import { config } from "~/lib/config.server";
import { StoreUnavailableError, checkKey, type FileStore } from "./store.server";

export type S3Settings = typeof config.s3;

/** A client for the settings (the timeouts keep a store that is down from holding a request). */
export function s3Client(s: S3Settings): S3Client {
  return new S3Client({
    endpoint: s.endpoint,
    region: s.region,
    forcePathStyle: true,
    credentials: { accessKeyId: s.accessKeyId, secretAccessKey: s.secretAccessKey },
    requestChecksumCalculation: "WHEN_REQUIRED",
    responseChecksumValidation: "WHEN_REQUIRED",
    maxAttempts: 2,
    requestHandler: { connectionTimeout: 3000, requestTimeout: 30_000 },
  });
}

const isMissing = (err: unknown) =>
  err instanceof S3ServiceException && (err.name === "NoSuchKey" || err.$metadata.httpStatusCode === 404);

/** Turns any failure of the store into a StoreUnavailableError saying what went wrong. */
function unavailable(err: unknown, bucket: string): never {
  if (err instanceof S3ServiceException) {
    const status = err.$metadata.httpStatusCode;
    if (err.name === "NoSuchBucket" || (status === 404 && err.name === "NotFound"))
      throw new StoreUnavailableError(`the bucket "${bucket}" does not exist`, err);
    if (status === 403 || /InvalidAccessKeyId|SignatureDoesNotMatch|AccessDenied/.test(err.name))
      throw new StoreUnavailableError(`the store refused the credentials for bucket "${bucket}"`, err);
    throw new StoreUnavailableError(`the store answered ${status ?? "an error"} (${err.name})`, err);
  }
  throw new StoreUnavailableError(`the store could not be reached (${(err as Error).message})`, err);
}

/** Files as objects of one bucket, under the same keys as on disk. */
export function s3Store(settings: S3Settings = config.s3): FileStore {
  const { bucket } = settings;
  if (!bucket) throw new StoreUnavailableError("S3_BUCKET is not set");
  const client = s3Client(settings);
  const guard = async <T>(work: () => Promise<T>): Promise<T> => {
    try {
      return await work();
    } catch (err) {
      if (err instanceof StoreUnavailableError) throw err;
      unavailable(err, bucket);
    }
  };
  return {
    describe: () => `bucket "${bucket}" at ${settings.endpoint ?? "AWS S3"}`,
    // The bucket exists and the credentials are accepted (s3rver fails a listing of one key).
    check: () => guard(async () => void (await client.send(new HeadBucketCommand({ Bucket: bucket })))),
    put: (key, bytes) =>
      guard(async () => {
        checkKey(key);
        await client.send(
          new PutObjectCommand({ Bucket: bucket, Key: key, Body: bytes, ContentLength: bytes.byteLength }),
        );
      }),
    async get(key) {
      const opened = await this.open(key);
      if (!opened) return null;
      return guard(async () => new Uint8Array(await new Response(opened.body).arrayBuffer()));
    },
    open: (key) =>
      guard(async () => {
        checkKey(key);
        try {
          const out = await client.send(new GetObjectCommand({ Bucket: bucket, Key: key }));
          if (!out.Body) return null;
          return { body: out.Body.transformToWebStream(), size: Number(out.ContentLength ?? 0) };
        } catch (err) {
          if (isMissing(err) && !(err instanceof S3ServiceException && err.name === "NoSuchBucket"))
            return null;
          throw err;
        }
      }),
    delete: (key) =>
      guard(async () => {
        checkKey(key);
        await client.send(new DeleteObjectCommand({ Bucket: bucket, Key: key }));
      }),
    list: () =>
      guard(async () => {
        const out: { key: string; modifiedMs: number; size: number }[] = [];
        let token: string | undefined;
        do {
          const page = await client.send(
            new ListObjectsV2Command({ Bucket: bucket, ContinuationToken: token }),
          );
          for (const o of page.Contents ?? [])
            if (o.Key)
              out.push({ key: o.Key, modifiedMs: o.LastModified?.getTime() ?? 0, size: o.Size ?? 0 });
          token = page.IsTruncated ? page.NextContinuationToken : undefined;
        } while (token);
        return out;
      }),
  };
}
